import type { CannerView, DayView, RecipeView, Role } from '@jarday/contracts';
import { CAUTIONS, type CautionId } from '@jarday/rules';
import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { useCloseDay } from '../api/close-day';
import { dayPaths } from '../utils/day-paths';
import { jarsText, processFor } from '../utils/labels';
import { BatchForm } from './batch-form';
import { LoadForm } from './load-form';

interface DayPlanProps {
  kitchenId: string;
  role: Role;
  day: DayView;
  recipes: readonly RecipeView[] | undefined;
  canners: readonly CannerView[] | undefined;
  links: { recipes: string; settings: string };
}

/** The cautions the day's loads call for, in the rules' order, without repeats. */
function dayCautions(day: DayView): CautionId[] {
  return [...new Set(day.loads.flatMap((l) => l.plan.cautionIds))];
}

/** A day's plan: its batches and loads, forms to add more, and the way to the Counter board and the Pocket view. */
export function DayPlan({ kitchenId, role, day, recipes, canners, links }: DayPlanProps) {
  const [closing, setClosing] = useState(false);
  const close = useCloseDay(kitchenId, day.id);
  const open = day.status === 'open';
  const lead = role === 'lead';

  return (
    <Stack spacing={4}>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
        <Button
          component={RouterLink}
          to={dayPaths.board(kitchenId, day.id)}
          variant="contained"
          size="large"
          sx={{ minHeight: 72, fontSize: '1.3rem' }}
        >
          Open the Counter board
        </Button>
        <Button
          component={RouterLink}
          to={dayPaths.pocket(kitchenId, day.id)}
          variant="outlined"
          size="large"
          sx={{ minHeight: 72 }}
        >
          Pocket view (phone)
        </Button>
      </Stack>

      <Stack component="section" spacing={2} aria-labelledby="batches">
        <Typography id="batches" variant="h2">
          Batches
        </Typography>
        {day.batches.length === 0 ? <Typography>No batches yet.</Typography> : null}
        {day.batches.map((b) => (
          <Card key={b.id}>
            <CardContent>
              <Typography variant="h3">{b.recipeName}</Typography>
              <Typography>
                {jarsText(b.jars, b.jarSize)}, {b.pack} pack{b.tested ? '' : ' · not a tested recipe'}
              </Typography>
            </CardContent>
          </Card>
        ))}
        {open && lead && recipes && recipes.length > 0 ? (
          <BatchForm kitchenId={kitchenId} dayId={day.id} recipes={recipes} />
        ) : null}
        {open && lead && recipes?.length === 0 ? (
          <Alert severity="info">
            The Recipe box is empty.{' '}
            <Link component={RouterLink} to={links.recipes}>
              Add a tested recipe
            </Link>{' '}
            first.
          </Alert>
        ) : null}
      </Stack>

      <Stack component="section" spacing={2} aria-labelledby="loads">
        <Typography id="loads" variant="h2">
          Canner loads
        </Typography>
        {day.loads.length === 0 ? <Typography>No loads yet.</Typography> : null}
        {day.loads.map((l) => (
          <Card key={l.id}>
            <CardContent>
              <Typography variant="h3">
                Load {l.number} · {l.cannerName}
              </Typography>
              <Typography>
                {l.jars} jars · {processFor(l)} · headspace {l.plan.headspace.label}
              </Typography>
            </CardContent>
          </Card>
        ))}
        {open && role !== 'watcher' && day.batches.length > 0 && canners && canners.length > 0 ? (
          <LoadForm kitchenId={kitchenId} dayId={day.id} batches={day.batches} loads={day.loads} canners={canners} />
        ) : null}
        {open && canners?.length === 0 ? (
          <Alert severity="info">
            No canners yet.{' '}
            <Link component={RouterLink} to={links.settings}>
              Add your canners
            </Link>{' '}
            with what they hold.
          </Alert>
        ) : null}
      </Stack>

      {dayCautions(day).map((id) => (
        <Alert key={id} severity="warning" role="note">
          <AlertTitle>{CAUTIONS[id].title}</AlertTitle>
          {CAUTIONS[id].text}
        </Alert>
      ))}

      {open && lead ? (
        <>
          <Button variant="outlined" color="error" onClick={() => setClosing(true)} sx={{ alignSelf: 'flex-start' }}>
            Close this day
          </Button>
          <ConfirmDialog
            open={closing}
            title="Close this canning day?"
            confirmLabel="Close the day"
            pending={close.isPending}
            error={close.isError ? close.error.message : null}
            onConfirm={() => close.mutate(undefined, { onSuccess: () => setClosing(false) })}
            onClose={() => setClosing(false)}
          >
            Its timers become read-only. The journal and the loads stay on record.
          </ConfirmDialog>
        </>
      ) : null}
    </Stack>
  );
}
