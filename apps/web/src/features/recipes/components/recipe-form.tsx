import type { CannerView, KitchenView, RecipeSaveNotice, RecipeView } from '@jarday/contracts';
import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { useEffect, useRef, useState, type FormEvent } from 'react';
import { splitServerError } from '../../../lib/form-errors';
import { useCreateRecipe } from '../api/create-recipe';
import { useUpdateRecipe } from '../api/update-recipe';
import { useRecipeDraft } from '../hooks/use-recipe-draft';
import { draftFromRecipe, emptyDraft } from '../utils/recipe-draft';
import { DraftPlanPreview } from './draft-plan-preview';
import { IngredientsEditor } from './ingredients-editor';
import { PrepStepsEditor } from './prep-steps-editor';
import { ProcessTableEditor } from './process-table-editor';
import { RecipeBasicsFields, RecipeSourceFields } from './recipe-basics-fields';
import { Section } from './section';

const FIELDS = [
  'name',
  'category',
  'productClass',
  'tested',
  'source',
  'headspaceInches',
  'acidification',
  'processing',
  'prepSteps',
  'ingredients',
  'notes',
] as const;

interface RecipeFormProps {
  kitchen: KitchenView;
  canners: readonly CannerView[];
  /** Given when editing; the recipe is then replaced whole (PUT). */
  recipe?: RecipeView;
  onSaved: (recipe: RecipeView, notice: RecipeSaveNotice | null) => void;
  onCancel: () => void;
}

const padded = { p: { xs: 2, sm: 3 } };

/** Writes or edits a recipe, checked with the server's schema as it is typed, with a live plan preview. */
export function RecipeForm({ kitchen, canners, recipe, onSaved, onCancel }: RecipeFormProps) {
  const editor = useRecipeDraft(() => (recipe ? draftFromRecipe(recipe) : emptyDraft()));
  const [general, setGeneral] = useState<string[] | null>(null);
  const [failedSaves, setFailedSaves] = useState(0);
  const formRef = useRef<HTMLFormElement>(null);
  const create = useCreateRecipe(kitchen.id, { onSuccess: (r) => onSaved(r, null) });
  const update = useUpdateRecipe(kitchen.id, { onSuccess: (saved) => onSaved(saved.recipe, saved.notice) });
  const pending = create.isPending || update.isPending;
  const { draft, edit, errors } = editor;

  // After a refused save, take the cook to the first field that needs attention.
  useEffect(() => {
    if (failedSaves > 0) formRef.current?.querySelector<HTMLElement>('[aria-invalid="true"]')?.focus();
  }, [failedSaves]);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const checked = editor.attempt();
    if (!checked.ok) {
      setGeneral([...new Set(Object.values(checked.errors))]);
      setFailedSaves((n) => n + 1);
      return;
    }
    setGeneral(null);
    const onError = (error: unknown) => {
      const split = splitServerError(error, FIELDS);
      editor.setServerErrors(split.fieldErrors);
      setGeneral(split.general ? [split.general] : [...new Set(Object.values(split.fieldErrors))]);
      setFailedSaves((n) => n + 1);
    };
    if (recipe) update.mutate({ recipeId: recipe.id, input: checked.data }, { onError });
    else create.mutate(checked.data, { onError });
  };

  return (
    <Stack
      component="form"
      ref={formRef}
      noValidate
      onSubmit={submit}
      spacing={5}
      aria-label={recipe ? 'Edit recipe' : 'New recipe'}
    >
      <Section title="About the recipe">
        <Card>
          <CardContent sx={padded}>
            <RecipeBasicsFields
              name={draft.name}
              category={draft.category}
              productClass={draft.productClass}
              headspace={draft.headspace}
              acidification={draft.acidification}
              errors={errors}
              edit={edit}
            />
          </CardContent>
        </Card>
      </Section>
      <Section title="Source and testing">
        <Card>
          <CardContent sx={padded}>
            <RecipeSourceFields
              tested={draft.tested}
              citation={draft.citation}
              url={draft.url}
              errors={errors}
              edit={edit}
            />
          </CardContent>
        </Card>
      </Section>
      <Section title="Process table">
        <Card>
          <CardContent sx={padded}>
            <ProcessTableEditor
              boilingWater={draft.boilingWater}
              pressure={draft.pressure}
              productClass={draft.productClass}
              errors={errors}
              edit={edit}
              testedProcessing={recipe?.tested ? recipe.processing : undefined}
            />
          </CardContent>
        </Card>
      </Section>
      <Section title="Plan preview">
        <Card>
          <CardContent sx={padded}>
            <DraftPlanPreview draft={editor.deferred} kitchen={kitchen} canners={canners} />
          </CardContent>
        </Card>
      </Section>
      <Section title="Prep steps">
        <PrepStepsEditor steps={draft.prepSteps} errors={errors} edit={edit} />
      </Section>
      <Section title="Ingredients">
        <IngredientsEditor ingredients={draft.ingredients} errors={errors} edit={edit} />
      </Section>
      <Section title="Notes">
        <TextField
          label="Recipe notes"
          value={draft.notes}
          onChange={(e) => edit('notes', (d) => ({ ...d, notes: e.target.value }))}
          error={Boolean(errors.notes)}
          helperText={errors.notes}
          multiline
          minRows={3}
        />
      </Section>
      {general ? (
        <Alert severity="error" role="alert">
          <AlertTitle>The recipe was not saved</AlertTitle>
          <Box component="ul" sx={{ m: 0, pl: 2.5 }}>
            {general.slice(0, 6).map((message) => (
              <li key={message}>{message}</li>
            ))}
          </Box>
        </Alert>
      ) : null}
      <Stack direction="row" spacing={1.5} sx={{ justifyContent: 'flex-end' }}>
        <Button onClick={onCancel}>Cancel</Button>
        <Button type="submit" variant="contained" size="large" disabled={pending}>
          {pending ? 'Saving…' : recipe ? 'Save recipe' : 'Add recipe'}
        </Button>
      </Stack>
    </Stack>
  );
}
