import Add from '@mui/icons-material/Add';
import Button from '@mui/material/Button';
import FormHelperText from '@mui/material/FormHelperText';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useCallback } from 'react';
import type { FieldErrors } from '../../../lib/form-errors';
import { emptyPressureRow, type PressureRowDraft } from '../utils/recipe-draft';
import { ProcessRowEditor } from './process-row-editor';

const BASE = 'processing.pressure';

interface PressureTableEditorProps {
  rows: PressureRowDraft[];
  errors: FieldErrors;
  onChange: (touch: string | null, change: (rows: PressureRowDraft[]) => PressureRowDraft[]) => void;
}

/** Pressure rows: minutes per jar and pack. The pounds come from the gauge table for the altitude, not from here. */
export function PressureTableEditor({ rows, errors, onChange }: PressureTableEditorProps) {
  const changeRow = useCallback(
    (r: number, touch: string, change: (row: PressureRowDraft) => PressureRowDraft) =>
      onChange(touch, (all) => all.map((x, i) => (i === r ? change(x) : x))),
    [onChange],
  );
  const removeRow = useCallback(
    (r: number) => onChange(`${BASE}.rows`, (all) => all.filter((_, i) => i !== r)),
    [onChange],
  );
  return (
    <Stack spacing={2}>
      <Typography sx={{ color: 'text.secondary' }}>
        Give the minutes at pressure. Jarday takes the pounds from the standard gauge table for your altitude (USDA
        Guide 1; PNW 421).
      </Typography>
      {rows.map((row, r) => (
        <ProcessRowEditor
          key={row.key}
          index={r}
          row={row}
          base={`${BASE}.rows`}
          errors={errors}
          canRemove={rows.length > 1}
          onChange={changeRow}
          onRemove={removeRow}
        />
      ))}
      {errors[`${BASE}.rows`] ? <FormHelperText error>{errors[`${BASE}.rows`]}</FormHelperText> : null}
      <Button
        startIcon={<Add />}
        variant="outlined"
        sx={{ alignSelf: 'flex-start' }}
        onClick={() => onChange(null, (all) => [...all, emptyPressureRow()])}
      >
        Add a pressure row
      </Button>
    </Stack>
  );
}
