import { RECIPE_CATEGORIES, type RecipeCategory } from '@jarday/contracts';
import { headspaceOf, PRODUCT_CLASSES, type ProductClass } from '@jarday/rules';
import Checkbox from '@mui/material/Checkbox';
import FormControlLabel from '@mui/material/FormControlLabel';
import FormHelperText from '@mui/material/FormHelperText';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { memo, useId } from 'react';
import { ChoiceField } from '../../../components/ui/choice-field';
import type { EditDraft } from '../hooks/use-recipe-draft';
import type { FieldErrors } from '../../../lib/form-errors';
import type { RecipeDraft } from '../utils/recipe-draft';
import { CATEGORY_LABELS, PRODUCT_CLASS_LABELS } from '../utils/recipe-labels';
import { UntestedBadge } from './untested-badge';
import { NATIVE_SELECT } from '../utils/field-props';

/** Headspaces in eighths of an inch up to 2 in, as the schema accepts; published values are quarters (USDA Guide 1). */
const HEADSPACES = Array.from({ length: 16 }, (_, i) => (i + 1) / 8);

type BasicsProps = Pick<RecipeDraft, 'name' | 'category' | 'productClass' | 'headspace' | 'acidification'> & {
  errors: FieldErrors;
  edit: EditDraft;
};

/** Name, category, product class, headspace and acidification. */
export const RecipeBasicsFields = memo(function RecipeBasicsFields({ errors, edit, ...draft }: BasicsProps) {
  return (
    <Stack spacing={3}>
      <TextField
        label="Recipe name"
        value={draft.name}
        onChange={(e) => edit('name', (d) => ({ ...d, name: e.target.value }))}
        error={Boolean(errors.name)}
        helperText={errors.name}
        slotProps={{ htmlInput: { autoComplete: 'off' } }}
      />
      <TextField
        select
        label="Category"
        value={draft.category}
        onChange={(e) => edit('category', (d) => ({ ...d, category: e.target.value as RecipeCategory }))}
        error={Boolean(errors.category)}
        helperText={
          errors.category ??
          (draft.category === 'salsa' ? 'In a tested salsa only spices and herbs may change.' : undefined)
        }
        slotProps={NATIVE_SELECT}
      >
        {RECIPE_CATEGORIES.map((c) => (
          <option key={c} value={c}>
            {CATEGORY_LABELS[c]}
          </option>
        ))}
      </TextField>
      <ChoiceField
        label="Product class"
        value={draft.productClass}
        options={PRODUCT_CLASSES.map((c) => ({ value: c, label: PRODUCT_CLASS_LABELS[c] }))}
        onChange={(productClass: ProductClass) => edit('productClass', (d) => ({ ...d, productClass }))}
        error={errors.productClass}
        hint="21 CFR 114.3: acid foods have a natural pH of 4.6 or below; low-acid foods need a pressure canner."
      />
      <TextField
        select
        label="Headspace"
        value={draft.headspace}
        onChange={(e) => edit('headspaceInches', (d) => ({ ...d, headspace: e.target.value }))}
        error={Boolean(errors.headspaceInches)}
        helperText={errors.headspaceInches ?? 'Space left between the food and the jar rim.'}
        slotProps={NATIVE_SELECT}
      >
        <option value="">Choose the headspace</option>
        {HEADSPACES.map((inches) => (
          <option key={inches} value={String(inches)}>
            {headspaceOf(inches).label}
          </option>
        ))}
      </TextField>
      <TextField
        select
        label="Acidification"
        value={draft.acidification}
        onChange={(e) => edit('acidification', (d) => ({ ...d, acidification: e.target.value as '' | 'tomato' }))}
        error={Boolean(errors.acidification)}
        helperText={
          errors.acidification ?? 'Tomatoes need bottled lemon juice or citric acid in every jar (USDA Guide 3).'
        }
        slotProps={NATIVE_SELECT}
      >
        <option value="">No acid added to the jars</option>
        <option value="tomato">Tomatoes: lemon juice or citric acid in each jar</option>
      </TextField>
    </Stack>
  );
});

type SourceProps = Pick<RecipeDraft, 'tested' | 'citation' | 'url'> & { errors: FieldErrors; edit: EditDraft };

/** Whether the recipe is a tested one, and who tested and published it. */
export const RecipeSourceFields = memo(function RecipeSourceFields({ errors, edit, ...draft }: SourceProps) {
  const hintId = useId();
  const citationError = errors['source.citation'] ?? errors.source;
  return (
    <Stack spacing={3}>
      <div>
        <FormControlLabel
          control={
            <Checkbox
              checked={draft.tested}
              onChange={(e) => edit('tested', (d) => ({ ...d, tested: e.target.checked }))}
              slotProps={{ input: { 'aria-describedby': hintId } }}
            />
          }
          label="This is a tested recipe"
        />
        <FormHelperText id={hintId} sx={{ mx: 0 }}>
          Tick only for a recipe tested and published by a recognised source (USDA, NCHFP, an extension service),
          followed exactly as published.
        </FormHelperText>
      </div>
      {draft.tested ? null : <UntestedBadge />}
      <TextField
        label="Source citation"
        value={draft.citation}
        onChange={(e) => edit('source', (d) => ({ ...d, citation: e.target.value }))}
        error={Boolean(citationError)}
        helperText={citationError ?? 'Who tested and published it: book, guide and page, or bulletin.'}
        multiline
        minRows={2}
      />
      <TextField
        label="Web address of the source (optional)"
        value={draft.url}
        onChange={(e) => edit('source', (d) => ({ ...d, url: e.target.value }))}
        error={Boolean(errors['source.url'])}
        helperText={errors['source.url']}
        slotProps={{ htmlInput: { inputMode: 'url', autoComplete: 'off' } }}
      />
    </Stack>
  );
});
