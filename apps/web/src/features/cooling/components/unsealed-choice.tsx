import type { JarOutcome } from '@jarday/contracts';
import { CAUTIONS } from '@jarday/rules';
import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Stack from '@mui/material/Stack';
import ToggleButton from '@mui/material/ToggleButton';
import ToggleButtonGroup from '@mui/material/ToggleButtonGroup';
import Typography from '@mui/material/Typography';
import { OUTCOME_LABELS } from '../utils/seal-labels';

interface UnsealedChoiceProps {
  jarNumber: number;
  value: JarOutcome | null;
  reprocessOpen: boolean;
  missing: boolean;
  disabled: boolean;
  onChange: (outcome: JarOutcome) => void;
}

export function UnsealedChoice({ jarNumber, value, reprocessOpen, missing, disabled, onChange }: UnsealedChoiceProps) {
  const id = `unsealed-${jarNumber}`;
  return (
    <Stack spacing={1}>
      <Typography id={id} sx={{ fontWeight: 700, fontSize: '1.1rem' }}>
        Jar {jarNumber} did not seal: where does it go?
      </Typography>
      <ToggleButtonGroup
        exclusive
        value={value}
        disabled={disabled}
        aria-labelledby={id}
        aria-describedby={missing ? `${id}-missing` : undefined}
        aria-invalid={missing || undefined}
        onChange={(_, outcome: JarOutcome | null) => {
          if (outcome) onChange(outcome);
        }}
        sx={{ flexWrap: 'wrap', '& .MuiToggleButton-root': { minHeight: 64, px: 2.5 } }}
      >
        <ToggleButton value="fridge">{OUTCOME_LABELS.fridge}</ToggleButton>
        <ToggleButton value="reprocess" disabled={!reprocessOpen}>
          {OUTCOME_LABELS.reprocess}
        </ToggleButton>
      </ToggleButtonGroup>
      {missing ? (
        <Typography id={`${id}-missing`} sx={{ color: 'error.main', fontSize: '1rem' }}>
          Choose the fridge or reprocessing for jar {jarNumber}.
        </Typography>
      ) : null}
      {!reprocessOpen ? (
        <Typography sx={{ color: 'text.secondary', fontSize: '1rem' }}>
          The 24 hours to reprocess have passed: refrigerate this jar and eat it within a few days.
        </Typography>
      ) : null}
    </Stack>
  );
}

/** Shown as soon as a jar is marked not sealed, before anyone is tempted to open it. */
export function UnsealedCaution() {
  const unsealed = CAUTIONS['unsealed-jar'];
  return (
    <Alert severity="warning" role="note">
      <AlertTitle>{unsealed.title}</AlertTitle>
      {unsealed.text} {CAUTIONS['suspect-jars'].title}.
      {unsealed.source ? (
        <Typography component="span" sx={{ display: 'block', fontSize: '0.9rem', mt: 0.5 }}>
          Source: {unsealed.source}
        </Typography>
      ) : null}
    </Alert>
  );
}
