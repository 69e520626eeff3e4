import ContentCopy from '@mui/icons-material/ContentCopy';
import type { KitchenView } from '@jarday/contracts';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import type { QueryClient } from '@tanstack/react-query';
import { useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '../../components/ui/page-header';
import { Loading, QueryError } from '../../components/ui/query-state';
import { paths } from '../../config/paths';
import { cannersQueryOptions, useCanners } from '../../features/canners/api/get-canners';
import { kitchenQueryOptions } from '../../features/kitchens/api/get-kitchen';
import { useCopyRecipe } from '../../features/recipes/api/copy-recipe';
import { starterQueryOptions, useStarter } from '../../features/recipes/api/get-starter';
import { LocalPlanPanel } from '../../features/recipes/components/local-plan-panel';
import { RecipeReadView } from '../../features/recipes/components/recipe-read-view';
import { RecipeLoadError } from './recipe-missing';
import { ensureQuietly, WithKitchen } from './with-kitchen';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    const kitchenId = params.kitchenId ?? '';
    return ensureQuietly(
      Promise.all([
        queryClient.ensureQueryData(kitchenQueryOptions(kitchenId)),
        queryClient.ensureQueryData(starterQueryOptions(params.starterId ?? '')),
        queryClient.ensureQueryData(cannersQueryOptions(kitchenId)),
      ]),
    );
  };

function StarterPage({ kitchen }: { kitchen: KitchenView }) {
  const { starterId = '' } = useParams();
  const starter = useStarter(starterId);
  const canners = useCanners(kitchen.id);
  const navigate = useNavigate();
  const copy = useCopyRecipe(kitchen.id, {
    onSuccess: (recipe) =>
      void navigate(paths.recipe(kitchen.id, recipe.id), { state: { notice: { kind: 'copied' } } }),
  });
  const back = { to: paths.recipes(kitchen.id), label: 'Recipe box' };

  if (starter.isPending) return <Loading label="Loading the recipe" />;
  if (starter.isError) {
    return (
      <>
        <PageHeader title="Starter recipe" back={back} />
        <RecipeLoadError kitchenId={kitchen.id} error={starter.error} onRetry={() => void starter.refetch()} />
      </>
    );
  }
  const plan = canners.isPending ? (
    <Loading label="Loading canners" />
  ) : canners.isError ? (
    <QueryError error={canners.error} onRetry={() => void canners.refetch()} />
  ) : (
    <LocalPlanPanel kitchen={kitchen} recipe={starter.data} canners={canners.data} />
  );

  return (
    <>
      <PageHeader
        title={starter.data.name}
        subtitle="Starter recipe, from published tables"
        back={back}
        actions={
          kitchen.role === 'lead' ? (
            <Button
              variant="contained"
              startIcon={<ContentCopy />}
              disabled={copy.isPending}
              onClick={() => copy.mutate(starter.data.id)}
            >
              {copy.isPending ? 'Copying…' : 'Copy to my kitchen'}
            </Button>
          ) : null
        }
      />
      {copy.isError ? (
        <Alert severity="error" sx={{ mb: 3 }}>
          {copy.error.message}
        </Alert>
      ) : null}
      <RecipeReadView kitchen={kitchen} recipe={starter.data} canners={canners.data ?? []} plan={plan} />
    </>
  );
}

export default function RecipeStarterRoute() {
  return <WithKitchen>{(kitchen) => <StarterPage kitchen={kitchen} />}</WithKitchen>;
}
