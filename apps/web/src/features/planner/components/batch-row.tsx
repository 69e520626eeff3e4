import type { RecipeView } from '@jarday/contracts';
import Delete from '@mui/icons-material/DeleteOutlined';
import IconButton from '@mui/material/IconButton';
import MenuItem from '@mui/material/MenuItem';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import ToggleButton from '@mui/material/ToggleButton';
import ToggleButtonGroup from '@mui/material/ToggleButtonGroup';
import type { FieldErrors } from '../../../lib/form-errors';
import { testedCombos } from '../utils/planner-labels';

export interface BatchDraft {
  key: string;
  recipeId: string;
  combo: string;
  by: 'jars' | 'produce';
  amount: string;
  unit: 'lb' | 'kg';
}

interface BatchRowProps {
  index: number;
  draft: BatchDraft;
  recipes: readonly RecipeView[];
  errors: FieldErrors;
  onChange: (patch: Partial<BatchDraft>) => void;
  onRemove: (() => void) | null;
}

/** One recipe at a scale: the recipe, its tested jar and pack, and how much, by jar count or produce weight. */
export function BatchRow({ index, draft, recipes, errors, onChange, onRemove }: BatchRowProps) {
  const recipe = recipes.find((r) => r.id === draft.recipeId);
  const combos = recipe ? testedCombos(recipe) : [];
  const n = index + 1;
  const amountError = errors[`batches.${index}.jars`] ?? errors[`batches.${index}.produce.value`];
  return (
    <Stack
      component="fieldset"
      spacing={2}
      sx={{ border: 1, borderColor: 'divider', borderRadius: 3, p: 2, m: 0 }}
      aria-label={`Batch ${n}`}
    >
      <Stack direction={{ xs: 'column', md: 'row' }} spacing={2}>
        <TextField
          select
          label={`Recipe ${n}`}
          value={draft.recipeId}
          onChange={(e) => onChange({ recipeId: e.target.value, combo: '' })}
          sx={{ flex: 2 }}
        >
          {recipes.map((r) => (
            <MenuItem key={r.id} value={r.id}>
              {r.name}
              {r.tested ? '' : ' (not a tested recipe)'}
            </MenuItem>
          ))}
        </TextField>
        <TextField
          select
          label={`Jars and pack ${n}`}
          value={combos.some((c) => c.key === draft.combo) ? draft.combo : (combos[0]?.key ?? '')}
          onChange={(e) => onChange({ combo: e.target.value })}
          helperText="Only sizes and packs with a tested time."
          sx={{ flex: 1 }}
        >
          {combos.map((c) => (
            <MenuItem key={c.key} value={c.key}>
              {c.label}
            </MenuItem>
          ))}
        </TextField>
      </Stack>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2} sx={{ alignItems: { sm: 'flex-start' } }}>
        <ToggleButtonGroup
          exclusive
          value={draft.by}
          onChange={(_, by: BatchDraft['by'] | null) => by && onChange({ by })}
          aria-label={`Batch ${n} size by`}
        >
          <ToggleButton value="jars">Jar count</ToggleButton>
          <ToggleButton value="produce">Produce weight</ToggleButton>
        </ToggleButtonGroup>
        <TextField
          label={draft.by === 'jars' ? `Jars ${n}` : `Produce ${n} (${draft.unit})`}
          value={draft.amount}
          onChange={(e) => onChange({ amount: e.target.value })}
          error={Boolean(amountError)}
          helperText={
            amountError ?? (draft.by === 'produce' ? 'Counted by the recipe’s published yield.' : 'Filled jars.')
          }
          slotProps={{ htmlInput: { inputMode: draft.by === 'jars' ? 'numeric' : 'decimal' } }}
          sx={{ flex: 1 }}
        />
        {draft.by === 'produce' ? (
          <ToggleButtonGroup
            exclusive
            value={draft.unit}
            onChange={(_, unit: BatchDraft['unit'] | null) => unit && onChange({ unit })}
            aria-label={`Batch ${n} weight unit`}
          >
            <ToggleButton value="lb">lb</ToggleButton>
            <ToggleButton value="kg">kg</ToggleButton>
          </ToggleButtonGroup>
        ) : null}
        {onRemove ? (
          <IconButton onClick={onRemove} aria-label={`Remove batch ${n}`}>
            <Delete />
          </IconButton>
        ) : null}
      </Stack>
    </Stack>
  );
}
