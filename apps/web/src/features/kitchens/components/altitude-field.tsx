import { type AltitudeUnit } from '@jarday/rules';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import ToggleButton from '@mui/material/ToggleButton';
import ToggleButtonGroup from '@mui/material/ToggleButtonGroup';

interface AltitudeFieldProps {
  value: string;
  unit: AltitudeUnit;
  onValueChange: (value: string) => void;
  onUnitChange: (unit: AltitudeUnit) => void;
  error?: string;
}

/** Altitude as typed, with a feet/metres switch; the number is not converted when the unit flips. */
export function AltitudeField({ value, unit, onValueChange, onUnitChange, error }: AltitudeFieldProps) {
  return (
    <Stack direction="row" spacing={1.5} sx={{ alignItems: 'flex-start' }}>
      <TextField
        label="Altitude"
        value={value}
        onChange={(e) => onValueChange(e.target.value)}
        error={Boolean(error)}
        helperText={error ?? 'Height of the kitchen above sea level. Process times depend on it.'}
        slotProps={{ htmlInput: { inputMode: 'decimal', autoComplete: 'off' } }}
      />
      <ToggleButtonGroup
        exclusive
        value={unit}
        onChange={(_e, next: AltitudeUnit | null) => {
          if (next) onUnitChange(next);
        }}
        aria-label="Altitude unit"
        color="primary"
      >
        <ToggleButton value="ft" aria-label="Feet">
          ft
        </ToggleButton>
        <ToggleButton value="m" aria-label="Metres">
          m
        </ToggleButton>
      </ToggleButtonGroup>
    </Stack>
  );
}
