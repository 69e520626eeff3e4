import type { KitchenView } from '@jarday/contracts';
import type { QueryClient } from '@tanstack/react-query';
import { useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '../../components/ui/page-header';
import { Loading, QueryError } from '../../components/ui/query-state';
import { paths } from '../../config/paths';
import { cannersQueryOptions, useCanners } from '../../features/canners/api/get-canners';
import { kitchenQueryOptions } from '../../features/kitchens/api/get-kitchen';
import { recipeQueryOptions, useRecipe } from '../../features/recipes/api/get-recipe';
import { RecipeForm } from '../../features/recipes/components/recipe-form';
import type { RecipePageNotice } from '../../features/recipes/components/recipe-notice';
import { BackToBox, RecipeLoadError } from './recipe-missing';
import { ensureQuietly, WithKitchen } from './with-kitchen';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    const kitchenId = params.kitchenId ?? '';
    return ensureQuietly(
      Promise.all([
        queryClient.ensureQueryData(kitchenQueryOptions(kitchenId)),
        queryClient.ensureQueryData(recipeQueryOptions(kitchenId, params.recipeId ?? '')),
        queryClient.ensureQueryData(cannersQueryOptions(kitchenId)),
      ]),
    );
  };

function EditRecipePage({ kitchen }: { kitchen: KitchenView }) {
  const { recipeId = '' } = useParams();
  const recipe = useRecipe(kitchen.id, recipeId);
  const canners = useCanners(kitchen.id);
  const navigate = useNavigate();
  const back = { to: paths.recipe(kitchen.id, recipeId), label: recipe.data?.name ?? 'Recipe' };

  if (kitchen.role !== 'lead') {
    return (
      <>
        <PageHeader title="Edit recipe" back={back} />
        <BackToBox kitchenId={kitchen.id}>Only a lead of this kitchen can edit recipes.</BackToBox>
      </>
    );
  }
  if (recipe.isPending || canners.isPending) return <Loading label="Loading the recipe" />;
  if (recipe.isError) {
    return <RecipeLoadError kitchenId={kitchen.id} error={recipe.error} onRetry={() => void recipe.refetch()} />;
  }
  if (canners.isError) return <QueryError error={canners.error} onRetry={() => void canners.refetch()} />;

  return (
    <>
      <PageHeader title={`Edit ${recipe.data.name}`} subtitle={kitchen.name} back={back} />
      <RecipeForm
        // A fresh form when another recipe is opened, so no draft carries over.
        key={recipe.data.id}
        kitchen={kitchen}
        canners={canners.data}
        recipe={recipe.data}
        onSaved={(saved, notice) => {
          const next: RecipePageNotice = notice?.untestedBecause
            ? { kind: 'untested', message: notice.untestedBecause }
            : { kind: 'saved' };
          void navigate(paths.recipe(kitchen.id, saved.id), { state: { notice: next } });
        }}
        onCancel={() => void navigate(paths.recipe(kitchen.id, recipeId))}
      />
    </>
  );
}

export default function RecipeEditRoute() {
  return <WithKitchen>{(kitchen) => <EditRecipePage kitchen={kitchen} />}</WithKitchen>;
}
