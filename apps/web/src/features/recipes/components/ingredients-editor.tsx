import Add from '@mui/icons-material/Add';
import Delete from '@mui/icons-material/DeleteOutlined';
import { MASS_UNITS, VOLUME_UNITS, type AmountUnit } from '@jarday/rules';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Grid from '@mui/material/Grid';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { memo } from 'react';
import type { FieldErrors } from '../../../lib/form-errors';
import type { EditDraft } from '../hooks/use-recipe-draft';
import { emptyIngredient, type IngredientDraft } from '../utils/recipe-draft';
import { UNIT_LABELS } from '../utils/recipe-labels';
import { NATIVE_SELECT } from '../utils/field-props';

/** Ingredients: name, an optional amount (number and unit) and a note. */
export const IngredientsEditor = memo(function IngredientsEditor(props: {
  ingredients: IngredientDraft[];
  errors: FieldErrors;
  edit: EditDraft;
}) {
  const { ingredients, errors, edit } = props;
  const change = (i: number, patch: Partial<IngredientDraft>) =>
    edit(`ingredients.${i}`, (d) => ({
      ...d,
      ingredients: d.ingredients.map((x, j) => (j === i ? { ...x, ...patch } : x)),
    }));

  return (
    <Stack spacing={2}>
      {ingredients.length === 0 ? <Typography sx={{ color: 'text.secondary' }}>No ingredients yet.</Typography> : null}
      {ingredients.map((item, i) => {
        const n = i + 1;
        const amountError = errors[`ingredients.${i}.amount.value`] ?? errors[`ingredients.${i}.amount`];
        return (
          <Box key={item.key} sx={{ border: 1, borderColor: 'divider', borderRadius: 3, p: { xs: 1.5, sm: 2 } }}>
            <Grid container spacing={1.5}>
              <Grid size={{ xs: 12, sm: 6 }}>
                <TextField
                  label={`Ingredient ${n}`}
                  value={item.name}
                  onChange={(e) => change(i, { name: e.target.value })}
                  error={Boolean(errors[`ingredients.${i}.name`])}
                  helperText={errors[`ingredients.${i}.name`]}
                />
              </Grid>
              <Grid size={{ xs: 6, sm: 3 }}>
                <TextField
                  label={`Ingredient ${n} amount`}
                  value={item.value}
                  onChange={(e) => change(i, { value: e.target.value })}
                  error={Boolean(amountError)}
                  helperText={amountError}
                  slotProps={{ htmlInput: { inputMode: 'decimal', autoComplete: 'off' } }}
                />
              </Grid>
              <Grid size={{ xs: 6, sm: 3 }}>
                <TextField
                  select
                  label={`Ingredient ${n} unit`}
                  value={item.unit}
                  onChange={(e) => change(i, { unit: e.target.value as AmountUnit | '' })}
                  error={Boolean(errors[`ingredients.${i}.amount.unit`] ?? amountError)}
                  slotProps={NATIVE_SELECT}
                >
                  <option value="">No unit</option>
                  {[...VOLUME_UNITS, ...MASS_UNITS].map((u) => (
                    <option key={u} value={u}>
                      {UNIT_LABELS[u]}
                    </option>
                  ))}
                </TextField>
              </Grid>
              <Grid size={{ xs: 12, sm: 9 }}>
                <TextField
                  label={`Ingredient ${n} note`}
                  value={item.note}
                  onChange={(e) => change(i, { note: e.target.value })}
                  error={Boolean(errors[`ingredients.${i}.note`])}
                  helperText={errors[`ingredients.${i}.note`]}
                />
              </Grid>
              <Grid size={{ xs: 12, sm: 3 }} sx={{ display: 'flex', alignItems: 'flex-start' }}>
                <Button
                  color="error"
                  startIcon={<Delete />}
                  aria-label={`Remove ingredient ${n}`}
                  onClick={() =>
                    edit('ingredients', (d) => ({ ...d, ingredients: d.ingredients.filter((_, j) => j !== i) }))
                  }
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
        onClick={() => edit(null, (d) => ({ ...d, ingredients: [...d.ingredients, emptyIngredient()] }))}
      >
        Add an ingredient
      </Button>
    </Stack>
  );
});
