import { JAR_SIZE_LABELS, JAR_SIZES, type JarSize } from '@jarday/rules';
import FormControl from '@mui/material/FormControl';
import FormHelperText from '@mui/material/FormHelperText';
import FormLabel from '@mui/material/FormLabel';
import Grid from '@mui/material/Grid';
import TextField from '@mui/material/TextField';
import { useId } from 'react';
import type { FieldErrors } from '../../../lib/form-errors';

export type CapacityText = Record<JarSize, string>;

/** One number per jar size: how many fit in one load. Empty means the canner does not take that size. */
export function CapacityFields({
  value,
  errors,
  onChange,
}: {
  value: CapacityText;
  errors: FieldErrors;
  onChange: (size: JarSize, text: string) => void;
}) {
  const hintId = useId();
  const overall = errors.capacity;
  return (
    <FormControl component="fieldset" error={Boolean(overall)} aria-describedby={hintId}>
      <FormLabel component="legend">Jars per load</FormLabel>
      <FormHelperText id={hintId} sx={{ mx: 0, mb: 1.5 }}>
        {overall ?? 'How many jars of each size stand in one load. Leave a size empty if it does not fit.'}
      </FormHelperText>
      <Grid container spacing={2}>
        {JAR_SIZES.map((size) => (
          <Grid key={size} size={{ xs: 6, sm: 4 }}>
            <TextField
              label={`${JAR_SIZE_LABELS[size]} jars`}
              value={value[size]}
              onChange={(e) => onChange(size, e.target.value)}
              error={Boolean(errors[`capacity.${size}`])}
              helperText={errors[`capacity.${size}`]}
              slotProps={{ htmlInput: { inputMode: 'numeric', autoComplete: 'off' } }}
            />
          </Grid>
        ))}
      </Grid>
    </FormControl>
  );
}
