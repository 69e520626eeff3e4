import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import type { FieldErrors } from '../../../lib/form-errors';

interface HeatingFieldsProps {
  waterLitres: string;
  burnerWatts: string;
  errors: FieldErrors;
  onChange: (patch: { waterLitres?: string; burnerWatts?: string }) => void;
}

/**
 * Optional figures for the Day planner's come-up estimate, used until the canner has logged days of its own.
 */
export function HeatingFields({ waterLitres, burnerWatts, errors, onChange }: HeatingFieldsProps) {
  return (
    <Stack component="fieldset" spacing={2} sx={{ border: 0, p: 0, m: 0 }}>
      <Typography component="legend" variant="h4" sx={{ mb: 1 }}>
        Heating (optional)
      </Typography>
      <Typography variant="body2" sx={{ color: 'text.secondary' }}>
        The Day planner learns how long this canner takes to boil from your logged days. Until then, these two figures
        let it estimate; leave them empty to use the usual 20–30 minutes.
      </Typography>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
        <TextField
          label="Water in the canner (litres)"
          value={waterLitres}
          onChange={(e) => onChange({ waterLitres: e.target.value })}
          error={Boolean(errors.waterLitres)}
          helperText={errors.waterLitres ?? 'With a load in and 1 inch over the jars. 1 US gallon is about 3.8 L.'}
          slotProps={{ htmlInput: { inputMode: 'decimal', autoComplete: 'off' } }}
          sx={{ flex: 1 }}
        />
        <TextField
          label="Burner power (watts)"
          value={burnerWatts}
          onChange={(e) => onChange({ burnerWatts: e.target.value })}
          error={Boolean(errors.burnerWatts)}
          helperText={errors.burnerWatts ?? 'The rating of the burner or element it sits on, e.g. 2400.'}
          slotProps={{ htmlInput: { inputMode: 'numeric', autoComplete: 'off' } }}
          sx={{ flex: 1 }}
        />
      </Stack>
    </Stack>
  );
}
