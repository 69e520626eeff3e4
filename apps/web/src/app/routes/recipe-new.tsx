import type { KitchenView } from '@jarday/contracts';
import type { QueryClient } from '@tanstack/react-query';
import { useNavigate, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '../../components/ui/page-header';
import { Loading, QueryError } from '../../components/ui/query-state';
import { paths } from '../../config/paths';
import { cannersQueryOptions, useCanners } from '../../features/canners/api/get-canners';
import { kitchenQueryOptions } from '../../features/kitchens/api/get-kitchen';
import { RecipeForm } from '../../features/recipes/components/recipe-form';
import { BackToBox } from './recipe-missing';
import { ensureQuietly, WithKitchen } from './with-kitchen';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    const kitchenId = params.kitchenId ?? '';
    return ensureQuietly(
      Promise.all([
        queryClient.ensureQueryData(kitchenQueryOptions(kitchenId)),
        queryClient.ensureQueryData(cannersQueryOptions(kitchenId)),
      ]),
    );
  };

function NewRecipePage({ kitchen }: { kitchen: KitchenView }) {
  const canners = useCanners(kitchen.id);
  const navigate = useNavigate();
  const back = { to: paths.recipes(kitchen.id), label: 'Recipe box' };

  if (kitchen.role !== 'lead') {
    return (
      <>
        <PageHeader title="New recipe" back={back} />
        <BackToBox kitchenId={kitchen.id}>Only a lead of this kitchen can add recipes.</BackToBox>
      </>
    );
  }
  return (
    <>
      <PageHeader title="New recipe" subtitle={kitchen.name} back={back} />
      {canners.isPending ? (
        <Loading label="Loading canners" />
      ) : canners.isError ? (
        <QueryError error={canners.error} onRetry={() => void canners.refetch()} />
      ) : (
        <RecipeForm
          kitchen={kitchen}
          canners={canners.data}
          onSaved={(recipe) =>
            void navigate(paths.recipe(kitchen.id, recipe.id), { state: { notice: { kind: 'saved' } } })
          }
          onCancel={() => void navigate(paths.recipes(kitchen.id))}
        />
      )}
    </>
  );
}

export default function RecipeNewRoute() {
  return <WithKitchen>{(kitchen) => <NewRecipePage kitchen={kitchen} />}</WithKitchen>;
}
