import type { CannerView, KitchenView, RecipeView } from '@jarday/contracts';
import Stack from '@mui/material/Stack';
import { Loading, QueryError } from '../../../components/ui/query-state';
import { useRecipePlan } from '../api/get-recipe-plan';
import { tablesOf, usePlanChoice } from '../hooks/use-plan-choice';
import { NoCanners } from './no-canners';
import { PlanChooser } from './plan-chooser';
import { PlanOutput } from './plan-output';

interface RecipePlanPanelProps {
  kitchen: KitchenView;
  recipe: RecipeView;
  canners: readonly CannerView[];
}

/** The server's plan for a saved recipe: choose jar, pack and canner, read the plan or the reason there is none. */
export function RecipePlanPanel({ kitchen, recipe, canners }: RecipePlanPanelProps) {
  const choice = usePlanChoice(tablesOf(recipe.processing), canners);
  const query =
    choice.row && choice.canner
      ? { jarSize: choice.row.jarSize, pack: choice.row.pack, cannerId: choice.canner.id }
      : null;
  const plan = useRecipePlan(kitchen.id, recipe.id, query);

  if (canners.length === 0) return <NoCanners kitchenId={kitchen.id} />;
  return (
    <Stack spacing={3}>
      <PlanChooser choice={choice} canners={canners} />
      {plan.isPending ? (
        <Loading label="Working out the plan" />
      ) : plan.isError ? (
        <QueryError error={plan.error} onRetry={() => void plan.refetch()} />
      ) : (
        <PlanOutput answer={plan.data} units={kitchen.units} />
      )}
    </Stack>
  );
}
