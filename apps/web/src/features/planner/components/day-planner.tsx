import { planRequestSchema, type CannerView, type DayView, type PlanRequest, type RecipeView } from '@jarday/contracts';
import Add from '@mui/icons-material/Add';
import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Button from '@mui/material/Button';
import Checkbox from '@mui/material/Checkbox';
import FormControl from '@mui/material/FormControl';
import FormControlLabel from '@mui/material/FormControlLabel';
import FormGroup from '@mui/material/FormGroup';
import FormHelperText from '@mui/material/FormHelperText';
import FormLabel from '@mui/material/FormLabel';
import LinearProgress from '@mui/material/LinearProgress';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useMemo, useState } from 'react';
import { validate } from '../../../lib/form-errors';
import { usePlanPreview } from '../api/preview-plan';
import { useStartPlan } from '../api/start-plan';
import { testedCombos } from '../utils/planner-labels';
import { BatchRow, type BatchDraft } from './batch-row';
import { PlanSummary } from './plan-summary';
import { PlanTimeline } from './plan-timeline';

interface DayPlannerProps {
  kitchenId: string;
  canStart: boolean;
  recipes: readonly RecipeView[];
  canners: readonly CannerView[];
  /** Today's date and a start time, from the route (libs and features take no clock of their own). */
  initial: { date: string; time: string };
  onStarted: (day: DayView) => void;
}

let nextKey = 0;
const newDraft = (recipeId = ''): BatchDraft => ({
  key: `b${(nextKey += 1)}`,
  recipeId,
  combo: '',
  by: 'jars',
  amount: '',
  unit: 'lb',
});

/** The form's drafts as a plan request, checked with the same schema the server uses. */
function toRequest(
  drafts: BatchDraft[],
  recipes: readonly RecipeView[],
  cannerIds: string[],
  date: string,
  time: string,
) {
  const startAt = new Date(`${date}T${time}`);
  const batches = drafts.map((d) => {
    const recipe = recipes.find((r) => r.id === d.recipeId);
    const combos = recipe ? testedCombos(recipe) : [];
    const combo = combos.find((c) => c.key === d.combo) ?? combos[0];
    const amount = d.amount.trim() === '' ? undefined : Number(d.amount);
    return {
      recipeId: d.recipeId,
      jarSize: combo?.jarSize ?? 'pint',
      pack: combo?.pack ?? 'hot',
      ...(d.by === 'jars' ? { jars: amount } : { produce: { value: amount, unit: d.unit } }),
    };
  });
  return validate(planRequestSchema, {
    batches,
    cannerIds,
    startAt: Number.isNaN(startAt.getTime()) ? '' : startAt.toISOString(),
  });
}

/** Recipes and batch sizes, one canner or two, a start time: the plan updates as they change. */
export function DayPlanner({ kitchenId, canStart, recipes, canners, initial, onStarted }: DayPlannerProps) {
  const [drafts, setDrafts] = useState<BatchDraft[]>(() => [newDraft(recipes[0]?.id)]);
  const [cannerIds, setCannerIds] = useState<string[]>(() => (canners[0] ? [canners[0].id] : []));
  const [date, setDate] = useState(initial.date);
  const [time, setTime] = useState(initial.time);
  const [title, setTitle] = useState('Canning day');
  const checked = useMemo(
    () => toRequest(drafts, recipes, cannerIds, date, time),
    [drafts, recipes, cannerIds, date, time],
  );
  const request: PlanRequest | null = checked.ok ? checked.data : null;
  const preview = usePlanPreview(kitchenId, request);
  const start = useStartPlan(kitchenId, { onSuccess: onStarted });
  const errors = checked.ok ? {} : checked.errors;
  const touched = drafts.some((d) => d.amount.trim() !== '');

  const patch = (key: string, p: Partial<BatchDraft>) =>
    setDrafts((all) => all.map((d) => (d.key === key ? { ...d, ...p } : d)));
  const toggleCanner = (id: string) =>
    setCannerIds((ids) => (ids.includes(id) ? ids.filter((x) => x !== id) : [...ids, id].slice(-2)));
  const answer = preview.data;

  return (
    <Stack spacing={4}>
      <Stack component="section" spacing={2} aria-labelledby="planner-batches">
        <Typography id="planner-batches" variant="h2">
          What are you putting up?
        </Typography>
        {drafts.map((d, i) => (
          <BatchRow
            key={d.key}
            index={i}
            draft={d}
            recipes={recipes}
            errors={touched ? errors : {}}
            onChange={(p) => patch(d.key, p)}
            onRemove={drafts.length > 1 ? () => setDrafts((all) => all.filter((x) => x.key !== d.key)) : null}
          />
        ))}
        <Button
          startIcon={<Add />}
          variant="outlined"
          onClick={() => setDrafts((all) => [...all, newDraft(recipes[0]?.id)])}
          sx={{ alignSelf: 'flex-start' }}
        >
          Add another recipe
        </Button>
      </Stack>

      <Stack direction={{ xs: 'column', md: 'row' }} spacing={3}>
        <FormControl component="fieldset" error={Boolean(errors.cannerIds)} sx={{ flex: 1 }}>
          <FormLabel component="legend">Canners (one or two)</FormLabel>
          <FormGroup>
            {canners.map((c) => (
              <FormControlLabel
                key={c.id}
                control={<Checkbox checked={cannerIds.includes(c.id)} onChange={() => toggleCanner(c.id)} />}
                label={c.name}
              />
            ))}
          </FormGroup>
          {errors.cannerIds ? <FormHelperText>{errors.cannerIds}</FormHelperText> : null}
        </FormControl>
        <Stack spacing={2} sx={{ flex: 1 }}>
          <TextField label="Date" type="date" value={date} onChange={(e) => setDate(e.target.value)} />
          <TextField
            label="Start work at"
            type="time"
            value={time}
            onChange={(e) => setTime(e.target.value)}
            error={Boolean(errors.startAt)}
            helperText={errors.startAt ?? 'When the kitchen starts on the produce.'}
          />
        </Stack>
      </Stack>

      {preview.isFetching ? <LinearProgress aria-label="Planning" /> : null}
      {preview.isError ? <Alert severity="error">{preview.error.message}</Alert> : null}
      {answer && !answer.ok ? (
        <Alert severity="warning">
          <AlertTitle>This plan cannot be processed safely as chosen</AlertTitle>
          {answer.reasons.map((r, i) => (
            <Typography key={i}>{r.message}</Typography>
          ))}
        </Alert>
      ) : null}
      {answer?.ok && request ? (
        <Stack component="section" spacing={4} aria-labelledby="planner-plan">
          <Typography id="planner-plan" variant="h2">
            The plan
          </Typography>
          <PlanSummary plan={answer.plan} />
          <PlanTimeline plan={answer.plan} />
          <Alert severity="info">
            Process times are the tested times for your altitude; times marked “about” are allowances for planning. Time
            each load only from a full rolling boil. Follow your local extension service, and for food that is sold,
            local codes and licensed practice.
          </Alert>
          {canStart ? (
            <Stack spacing={2}>
              <TextField label="Name of the day" value={title} onChange={(e) => setTitle(e.target.value)} />
              {start.isError ? <Alert severity="error">{start.error.message}</Alert> : null}
              <Button
                variant="contained"
                size="large"
                disabled={start.isPending}
                onClick={() => start.mutate({ ...request, date, title })}
                sx={{ minHeight: 80, fontSize: '1.4rem' }}
              >
                {start.isPending ? 'Starting…' : 'Start this day'}
              </Button>
            </Stack>
          ) : (
            <Alert severity="info">Only the kitchen’s lead starts a canning day.</Alert>
          )}
        </Stack>
      ) : null}
    </Stack>
  );
}
