import Delete from '@mui/icons-material/DeleteOutlined';
import { JAR_SIZE_LABELS, JAR_SIZES, PACK_STYLES, type JarSize, type PackStyle } from '@jarday/rules';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import FormHelperText from '@mui/material/FormHelperText';
import Grid from '@mui/material/Grid';
import InputAdornment from '@mui/material/InputAdornment';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { memo } from 'react';
import type { FieldErrors } from '../../../lib/form-errors';
import { PACK_LABELS, rowLabel } from '../utils/recipe-labels';
import { NATIVE_SELECT } from '../utils/field-props';

interface RowShape {
  jarSize: JarSize;
  pack: PackStyle;
  /** One cell per band (boiling water) or a single time (pressure). */
  minutes: string[] | string;
}

interface ProcessRowEditorProps<R extends RowShape> {
  index: number;
  row: R;
  /** Path of the rows in the schema, e.g. `processing.boilingWater.rows`. */
  base: string;
  errors: FieldErrors;
  /** Boiling water: one label per band; pressure rows have none. */
  bandLabels?: string[];
  canRemove: boolean;
  onChange: (index: number, touch: string, change: (row: R) => R) => void;
  onRemove: (index: number) => void;
}

/** "Above 6,000 ft" reads "above 6,000 ft" inside a longer name. */
const lowerFirst = (text: string) => text.charAt(0).toLowerCase() + text.slice(1);
const minutesInput = {
  inputMode: 'numeric',
  autoComplete: 'off',
} as const;

/** One jar size and pack of a process table: its pickers, its minutes and a remove button. */
function ProcessRowEditorFields<R extends RowShape>(props: ProcessRowEditorProps<R>) {
  const { index, row, base, errors, bandLabels, canRemove, onRemove } = props;
  const onChange = (touch: string, change: (row: R) => R) => props.onChange(index, touch, change);
  const path = `${base}.${index}`;
  const kind = bandLabels ? '' : 'pressure ';
  const name = rowLabel(row).toLowerCase();
  const rowError = errors[path] ?? (bandLabels ? errors[`${path}.minutes`] : undefined);
  const adornment = { endAdornment: <InputAdornment position="end">min</InputAdornment> };

  return (
    <Box sx={{ border: 1, borderColor: 'divider', borderRadius: 3, p: { xs: 1.5, sm: 2 } }}>
      <Stack spacing={2}>
        <Stack direction={{ xs: 'column', sm: 'row' }} spacing={1.5}>
          <TextField
            select
            label={`Jar size, ${kind}row ${index + 1}`}
            value={row.jarSize}
            onChange={(e) => onChange(base, (r) => ({ ...r, jarSize: e.target.value as JarSize }))}
            slotProps={NATIVE_SELECT}
          >
            {JAR_SIZES.map((size) => (
              <option key={size} value={size}>
                {JAR_SIZE_LABELS[size]}
              </option>
            ))}
          </TextField>
          <TextField
            select
            label={`Pack, ${kind}row ${index + 1}`}
            value={row.pack}
            onChange={(e) => onChange(base, (r) => ({ ...r, pack: e.target.value as PackStyle }))}
            slotProps={NATIVE_SELECT}
          >
            {PACK_STYLES.map((pack) => (
              <option key={pack} value={pack}>
                {PACK_LABELS[pack]}
              </option>
            ))}
          </TextField>
          {typeof row.minutes === 'string' ? (
            <TextField
              label="Minutes"
              value={row.minutes}
              onChange={(e) => onChange(path, (r) => ({ ...r, minutes: e.target.value }))}
              error={Boolean(errors[`${path}.minutes`])}
              helperText={errors[`${path}.minutes`]}
              slotProps={{
                htmlInput: { ...minutesInput, 'aria-label': `Pressure minutes for ${name}` },
                input: adornment,
                // The label stays above the box: inside, it would collide with the "min" unit on a phone.
                inputLabel: { shrink: true },
              }}
            />
          ) : null}
          <Button
            color="error"
            startIcon={<Delete />}
            disabled={!canRemove}
            onClick={() => onRemove(index)}
            aria-label={`Remove ${kind}row ${index + 1} (${name})`}
            sx={{ flexShrink: 0, alignSelf: { xs: 'flex-start', sm: 'center' } }}
          >
            Remove
          </Button>
        </Stack>
        {Array.isArray(row.minutes) && bandLabels ? (
          <Grid container spacing={1.5}>
            {row.minutes.map((minutes, band) => {
              const error = errors[`${path}.minutes.${band}`];
              return (
                <Grid key={band} size={{ xs: 6, sm: 3 }}>
                  <TextField
                    label={bandLabels[band]}
                    value={minutes}
                    onChange={(e) =>
                      onChange(path, (r) => ({
                        ...r,
                        minutes: (r.minutes as string[]).map((m, i) => (i === band ? e.target.value : m)),
                      }))
                    }
                    error={Boolean(error)}
                    helperText={error}
                    slotProps={{
                      htmlInput: {
                        ...minutesInput,
                        'aria-label': `Minutes for ${name} at ${lowerFirst(bandLabels[band] ?? '')}`,
                      },
                      input: adornment,
                      // The label stays above the box: inside, it would collide with the "min" unit on a phone.
                      inputLabel: { shrink: true },
                    }}
                  />
                </Grid>
              );
            })}
          </Grid>
        ) : null}
        {rowError ? <FormHelperText error>{rowError}</FormHelperText> : null}
      </Stack>
    </Box>
  );
}

/** Memoised: typing in one row leaves the other rows alone. */
export const ProcessRowEditor = memo(ProcessRowEditorFields) as typeof ProcessRowEditorFields;
