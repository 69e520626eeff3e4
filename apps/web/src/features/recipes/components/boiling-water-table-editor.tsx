import Add from '@mui/icons-material/Add';
import Delete from '@mui/icons-material/DeleteOutlined';
import { formatFeet } from '@jarday/rules';
import Button from '@mui/material/Button';
import Checkbox from '@mui/material/Checkbox';
import FormControlLabel from '@mui/material/FormControlLabel';
import FormHelperText from '@mui/material/FormHelperText';
import IconButton from '@mui/material/IconButton';
import InputAdornment from '@mui/material/InputAdornment';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import type { FieldErrors } from '../../../lib/form-errors';
import { addBand, draftBandLabels, draftBounds, removeBand } from '../utils/process-table-draft';
import { emptyBoilingRow, type BoilingRowDraft, type BoilingWaterDraft } from '../utils/recipe-draft';
import { useCallback, useMemo } from 'react';
import { ProcessRowEditor } from './process-row-editor';

const BASE = 'processing.boilingWater';

interface BoilingWaterTableEditorProps {
  table: BoilingWaterDraft;
  errors: FieldErrors;
  /** `touch` names the part of the table whose messages may now show. */
  onChange: (touch: string | null, change: (table: BoilingWaterDraft) => BoilingWaterDraft) => void;
}

/** Band bounds (upper limits in feet, the top band open) and one minutes cell per band for each jar and pack. */
export function BoilingWaterTableEditor({ table, errors, onChange }: BoilingWaterTableEditorProps) {
  const { bands, openTop } = table;
  // Kept while the bands stay the same, so typing a time re-renders only the row it is in.
  const labels = useMemo(() => draftBandLabels({ bands, openTop }), [bands, openTop]);
  const bounds = draftBounds(table);
  const last = table.bands.length - 1;
  const changeRow = useCallback(
    (r: number, touch: string, change: (row: BoilingRowDraft) => BoilingRowDraft) =>
      onChange(touch, (t) => ({ ...t, rows: t.rows.map((x, i) => (i === r ? change(x) : x)) })),
    [onChange],
  );
  const removeRow = useCallback(
    (r: number) => onChange(`${BASE}.rows`, (t) => ({ ...t, rows: t.rows.filter((_, i) => i !== r) })),
    [onChange],
  );
  const setBound = (index: number, bound: string) =>
    onChange(`${BASE}.bands`, (t) => ({ ...t, bands: t.bands.map((b, i) => (i === index ? { ...b, bound } : b)) }));

  return (
    <Stack spacing={3}>
      <Stack component="fieldset" spacing={2} sx={{ border: 0, p: 0, m: 0 }}>
        <Typography component="legend" variant="h4" sx={{ mb: 1 }}>
          Altitude bands
        </Typography>
        {table.bands.map((band, i) => {
          const from = i === 0 ? 0 : bounds[i - 1];
          const fromText =
            from === undefined || from === null ? 'the band below' : `${formatFeet(from + (i ? 1 : 0))} ft`;
          const error = errors[`${BASE}.bands.${i}`];
          return (
            <Stack key={band.key} direction="row" spacing={1.5} sx={{ alignItems: 'flex-start', maxWidth: 500 }}>
              {i === last && table.openTop ? (
                <Typography sx={{ flex: 1, minHeight: 56, display: 'flex', alignItems: 'center', maxWidth: 420 }}>
                  Band {i + 1}: {labels[i]?.replace(/^Above/, 'above')}
                </Typography>
              ) : (
                <TextField
                  sx={{ maxWidth: 420 }}
                  label={`Band ${i + 1} upper bound`}
                  value={band.bound}
                  onChange={(e) => setBound(i, e.target.value)}
                  error={Boolean(error)}
                  helperText={error ?? `From ${fromText} up to and including this height.`}
                  slotProps={{
                    htmlInput: { inputMode: 'numeric', autoComplete: 'off' },
                    input: { endAdornment: <InputAdornment position="end">ft</InputAdornment> },
                  }}
                />
              )}
              <IconButton
                aria-label={`Remove band ${i + 1}`}
                disabled={table.bands.length <= 1}
                onClick={() => onChange(`${BASE}.bands`, (t) => removeBand(t, i))}
              >
                <Delete />
              </IconButton>
            </Stack>
          );
        })}
        <FormControlLabel
          control={
            <Checkbox
              checked={table.openTop}
              onChange={(e) => onChange(`${BASE}.bands`, (t) => ({ ...t, openTop: e.target.checked }))}
            />
          }
          label="The top band has no upper limit"
        />
        {errors[`${BASE}.bands`] ? <FormHelperText error>{errors[`${BASE}.bands`]}</FormHelperText> : null}
        <Button
          startIcon={<Add />}
          variant="outlined"
          sx={{ alignSelf: 'flex-start' }}
          onClick={() => onChange(null, addBand)}
        >
          Add a band
        </Button>
      </Stack>
      <Stack spacing={2}>
        <Typography variant="h4" component="h4">
          Minutes by jar size and pack
        </Typography>
        {table.rows.map((row, r) => (
          <ProcessRowEditor
            key={row.key}
            index={r}
            row={row}
            base={`${BASE}.rows`}
            errors={errors}
            bandLabels={labels}
            canRemove={table.rows.length > 1}
            onChange={changeRow}
            onRemove={removeRow}
          />
        ))}
        {errors[`${BASE}.rows`] ? <FormHelperText error>{errors[`${BASE}.rows`]}</FormHelperText> : null}
        <Button
          startIcon={<Add />}
          variant="outlined"
          sx={{ alignSelf: 'flex-start' }}
          onClick={() => onChange(null, (t) => ({ ...t, rows: [...t.rows, emptyBoilingRow(t.bands.length)] }))}
        >
          Add a row
        </Button>
      </Stack>
    </Stack>
  );
}
