import type { CannerView, KitchenView, RecipeView } from '@jarday/contracts';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';
import { BoilingPointNote } from './boiling-point-note';
import { ProcessTableView } from './process-table-view';
import { RecipeCautions } from './recipe-cautions';
import { RecipeFacts } from './recipe-facts';
import { IngredientList, PrepStepList } from './recipe-method';
import { Section } from './section';
import { TestedStatus } from './untested-badge';

interface RecipeReadViewProps {
  kitchen: KitchenView;
  recipe: RecipeView;
  canners: readonly CannerView[];
  /** The plan preview: the server's for a saved recipe, the browser's for a starter. */
  plan: ReactNode;
}

const padded = { p: { xs: 2, sm: 3 } };

/** A recipe to read at the counter: source, tables at the kitchen's altitude, a plan preview, steps and cautions. */
export function RecipeReadView({ kitchen, recipe, canners, plan }: RecipeReadViewProps) {
  return (
    <Stack spacing={5}>
      <Stack direction="row" sx={{ flexWrap: 'wrap', gap: 1 }}>
        <TestedStatus tested={recipe.tested} />
      </Stack>
      <Section title="About this recipe">
        <Card>
          <CardContent sx={padded}>
            <RecipeFacts recipe={recipe} />
          </CardContent>
        </Card>
      </Section>
      <Section title="Process table">
        <Card>
          <CardContent sx={padded}>
            <Stack spacing={3}>
              <BoilingPointNote altitude={kitchen.altitude} units={kitchen.units} />
              <ProcessTableView processing={recipe.processing} altitude={kitchen.altitude} />
            </Stack>
          </CardContent>
        </Card>
      </Section>
      <Section title="Plan a load">
        <Card>
          <CardContent sx={padded}>{plan}</CardContent>
        </Card>
      </Section>
      <Section title="Prep steps">
        <PrepStepList steps={recipe.prepSteps} />
      </Section>
      <Section title="Ingredients">
        <IngredientList ingredients={recipe.ingredients} units={kitchen.units} />
      </Section>
      {recipe.notes ? (
        <Section title="Notes">
          <Typography sx={{ whiteSpace: 'pre-line' }}>{recipe.notes}</Typography>
        </Section>
      ) : null}
      <RecipeCautions recipe={recipe} hasDialCanner={canners.some((c) => c.gauge === 'dial')} />
    </Stack>
  );
}
