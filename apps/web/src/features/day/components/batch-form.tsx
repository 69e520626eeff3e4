import type { CreateBatchInput, RecipeView } from '@jarday/contracts';
import { describeRow, type JarSize, type PackStyle } from '@jarday/rules';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import MenuItem from '@mui/material/MenuItem';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useState, type FormEvent } from 'react';
import { createBatchSchema } from '@jarday/contracts';
import { numberOrUndefined, splitServerError, validate, type FieldErrors } from '../../../lib/form-errors';
import { useAddBatch } from '../api/add-batch';

/** The jar sizes and packs a recipe has a tested time for, by either method; only those can be chosen. */
export function testedCombos(
  recipe: Pick<RecipeView, 'processing'>,
): { key: string; jarSize: JarSize; pack: PackStyle; label: string }[] {
  const rows = [...(recipe.processing.boilingWater?.rows ?? []), ...(recipe.processing.pressure?.rows ?? [])];
  const seen = new Map<string, { key: string; jarSize: JarSize; pack: PackStyle; label: string }>();
  for (const r of rows) {
    const key = `${r.jarSize}/${r.pack}`;
    if (!seen.has(key)) seen.set(key, { key, jarSize: r.jarSize, pack: r.pack, label: describeRow(r.jarSize, r.pack) });
  }
  return [...seen.values()];
}

interface BatchFormProps {
  kitchenId: string;
  dayId: string;
  recipes: readonly RecipeView[];
}

/** A recipe from the Recipe box at a scale: which jars and pack (among the tested ones), and how many jars. */
export function BatchForm({ kitchenId, dayId, recipes }: BatchFormProps) {
  const [recipeId, setRecipeId] = useState(recipes[0]?.id ?? '');
  const recipe = recipes.find((r) => r.id === recipeId);
  const combos = recipe ? testedCombos(recipe) : [];
  const [comboKey, setComboKey] = useState('');
  const combo = combos.find((c) => c.key === comboKey) ?? combos[0];
  const [jars, setJars] = useState('');
  const [errors, setErrors] = useState<FieldErrors>({});
  const [general, setGeneral] = useState<string | null>(null);
  const add = useAddBatch(kitchenId, dayId, { onSuccess: () => setJars('') });

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const input: CreateBatchInput = {
      recipeId,
      jarSize: combo?.jarSize ?? 'pint',
      pack: combo?.pack ?? 'hot',
      jars: numberOrUndefined(jars),
    };
    const checked = validate(createBatchSchema, input);
    if (!checked.ok) return setErrors(checked.errors);
    setErrors({});
    setGeneral(null);
    add.mutate(checked.data, {
      onError: (error) => {
        const split = splitServerError(error, ['recipeId', 'jars']);
        setErrors(split.fieldErrors);
        setGeneral(split.general);
      },
    });
  };

  return (
    <Stack component="form" noValidate onSubmit={submit} spacing={2} aria-label="Add a batch">
      <Typography variant="h3">Add a batch</Typography>
      {general ? <Alert severity="error">{general}</Alert> : null}
      <TextField
        select
        label="Recipe"
        value={recipeId}
        onChange={(e) => {
          setRecipeId(e.target.value);
          setComboKey('');
        }}
        error={Boolean(errors.recipeId)}
        helperText={errors.recipeId}
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
        label="Jars and pack"
        value={combo?.key ?? ''}
        onChange={(e) => setComboKey(e.target.value)}
        helperText="Only the jar sizes and packs the recipe has a tested time for."
      >
        {combos.map((c) => (
          <MenuItem key={c.key} value={c.key}>
            {c.label}
          </MenuItem>
        ))}
      </TextField>
      <TextField
        label="Number of jars"
        value={jars}
        onChange={(e) => setJars(e.target.value)}
        error={Boolean(errors.jars)}
        helperText={errors.jars}
        slotProps={{ htmlInput: { inputMode: 'numeric' } }}
      />
      <Button type="submit" variant="contained" disabled={add.isPending || !recipe} sx={{ alignSelf: 'flex-start' }}>
        {add.isPending ? 'Adding…' : 'Add batch'}
      </Button>
    </Stack>
  );
}
