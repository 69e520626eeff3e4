import type { CannerView } from '@jarday/contracts';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { rowKey, type PlanChoice } from '../hooks/use-plan-choice';
import { GAUGE_NAMES, rowLabel } from '../utils/recipe-labels';
import { NATIVE_SELECT } from '../utils/field-props';

const cannerLabel = (c: CannerView) => `${c.name} (${c.gauge ? `pressure, ${GAUGE_NAMES[c.gauge]}` : 'boiling water'})`;

/** Jar size and pack (from the recipe's tested rows) and one of the kitchen's canners. */
export function PlanChooser({ choice, canners }: { choice: PlanChoice; canners: readonly CannerView[] }) {
  return (
    <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
      <TextField
        select
        label="Jar size and pack"
        value={choice.row ? rowKey(choice.row) : ''}
        onChange={(e) => choice.setRow(e.target.value)}
        disabled={choice.rows.length === 0}
        slotProps={NATIVE_SELECT}
      >
        {choice.rows.map((r) => (
          <option key={rowKey(r)} value={rowKey(r)}>
            {rowLabel(r)}
          </option>
        ))}
      </TextField>
      <TextField
        select
        label="Canner"
        value={choice.canner?.id ?? ''}
        onChange={(e) => choice.setCanner(e.target.value)}
        slotProps={NATIVE_SELECT}
      >
        {canners.map((c) => (
          <option key={c.id} value={c.id}>
            {cannerLabel(c)}
          </option>
        ))}
      </TextField>
    </Stack>
  );
}
