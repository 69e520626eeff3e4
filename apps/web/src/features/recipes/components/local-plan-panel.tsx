import type { CannerView, KitchenView, RecipeView } from '@jarday/contracts';
import Stack from '@mui/material/Stack';
import { tablesOf, usePlanChoice } from '../hooks/use-plan-choice';
import { planLocally } from '../utils/local-plan';
import { PlanChooser } from './plan-chooser';
import { PlanOutput } from './plan-output';
import { NoCanners } from './no-canners';

/** The plan for a starter before it is copied, worked out in the browser with the same rules as the server. */
export function LocalPlanPanel(props: { kitchen: KitchenView; recipe: RecipeView; canners: readonly CannerView[] }) {
  const { kitchen, recipe, canners } = props;
  const choice = usePlanChoice(tablesOf(recipe.processing), canners);
  if (canners.length === 0 || !choice.canner || !choice.row) return <NoCanners kitchenId={kitchen.id} />;
  const answer = planLocally({
    recipe,
    category: recipe.category,
    jarSize: choice.row.jarSize,
    pack: choice.row.pack,
    altitude: kitchen.altitude,
    canner: choice.canner,
  });
  return (
    <Stack spacing={3}>
      <PlanChooser choice={choice} canners={canners} />
      <PlanOutput answer={answer} units={kitchen.units} />
    </Stack>
  );
}
