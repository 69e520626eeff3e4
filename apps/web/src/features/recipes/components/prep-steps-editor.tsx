import Add from '@mui/icons-material/Add';
import Delete from '@mui/icons-material/DeleteOutlined';
import { PREP_STEP_KINDS, type PrepStepKind } from '@jarday/contracts';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Grid from '@mui/material/Grid';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { memo } from 'react';
import type { FieldErrors } from '../../../lib/form-errors';
import type { EditDraft } from '../hooks/use-recipe-draft';
import { emptyPrepStep, type PrepStepDraft } from '../utils/recipe-draft';
import { PREP_KIND_LABELS } from '../utils/recipe-labels';
import { NATIVE_SELECT } from '../utils/field-props';

const numeric = { inputMode: 'numeric', autoComplete: 'off' } as const;

/** Prep steps in order: kind, what to do, and how long the step guide should time it (blank for untimed steps). */
export const PrepStepsEditor = memo(function PrepStepsEditor(props: {
  steps: PrepStepDraft[];
  errors: FieldErrors;
  edit: EditDraft;
}) {
  const { steps, errors, edit } = props;
  const change = (i: number, patch: Partial<PrepStepDraft>) =>
    edit(`prepSteps.${i}`, (d) => ({ ...d, prepSteps: d.prepSteps.map((s, j) => (j === i ? { ...s, ...patch } : s)) }));

  return (
    <Stack spacing={2}>
      {steps.length === 0 ? <Typography sx={{ color: 'text.secondary' }}>No prep steps yet.</Typography> : null}
      {steps.map((step, i) => {
        const n = i + 1;
        const durationError = errors[`prepSteps.${i}.seconds`];
        return (
          <Box key={step.key} sx={{ border: 1, borderColor: 'divider', borderRadius: 3, p: { xs: 1.5, sm: 2 } }}>
            <Grid container spacing={1.5}>
              <Grid size={{ xs: 12, sm: 4 }}>
                <TextField
                  select
                  label={`Step ${n} kind`}
                  value={step.kind}
                  onChange={(e) => change(i, { kind: e.target.value as PrepStepKind })}
                  slotProps={NATIVE_SELECT}
                >
                  {PREP_STEP_KINDS.map((k) => (
                    <option key={k} value={k}>
                      {PREP_KIND_LABELS[k]}
                    </option>
                  ))}
                </TextField>
              </Grid>
              <Grid size={{ xs: 12, sm: 8 }}>
                <TextField
                  label={`Step ${n}`}
                  value={step.label}
                  onChange={(e) => change(i, { label: e.target.value })}
                  error={Boolean(errors[`prepSteps.${i}.label`])}
                  helperText={errors[`prepSteps.${i}.label`]}
                />
              </Grid>
              <Grid size={{ xs: 6, sm: 4 }}>
                <TextField
                  label={`Step ${n} minutes`}
                  value={step.minutes}
                  onChange={(e) => change(i, { minutes: e.target.value })}
                  error={Boolean(durationError)}
                  helperText={durationError ?? 'Blank if untimed'}
                  slotProps={{ htmlInput: numeric }}
                />
              </Grid>
              <Grid size={{ xs: 6, sm: 4 }}>
                <TextField
                  label={`Step ${n} seconds`}
                  value={step.seconds}
                  onChange={(e) => change(i, { seconds: e.target.value })}
                  error={Boolean(durationError)}
                  slotProps={{ htmlInput: numeric }}
                />
              </Grid>
              <Grid size={{ xs: 12, sm: 4 }} sx={{ display: 'flex', alignItems: 'flex-start' }}>
                <Button
                  color="error"
                  startIcon={<Delete />}
                  aria-label={`Remove step ${n}`}
                  onClick={() => edit('prepSteps', (d) => ({ ...d, prepSteps: d.prepSteps.filter((_, j) => j !== i) }))}
                >
                  Remove
                </Button>
              </Grid>
            </Grid>
          </Box>
        );
      })}
      <Button
        startIcon={<Add />}
        variant="outlined"
        sx={{ alignSelf: 'flex-start' }}
        onClick={() => edit(null, (d) => ({ ...d, prepSteps: [...d.prepSteps, emptyPrepStep()] }))}
      >
        Add a step
      </Button>
    </Stack>
  );
});
