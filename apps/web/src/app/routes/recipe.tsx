import Delete from '@mui/icons-material/DeleteOutlined';
import Edit from '@mui/icons-material/Edit';
import type { KitchenView } from '@jarday/contracts';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import type { QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { Link as RouterLink, useLocation, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { ConfirmDialog } from '../../components/ui/confirm-dialog';
import { PageHeader } from '../../components/ui/page-header';
import { Loading, QueryError } from '../../components/ui/query-state';
import { paths } from '../../config/paths';
import { AttachmentsPanel } from '../../features/attachments';
import { cannersQueryOptions, useCanners } from '../../features/canners/api/get-canners';
import { kitchenQueryOptions } from '../../features/kitchens/api/get-kitchen';
import { useDeleteRecipe } from '../../features/recipes/api/delete-recipe';
import { recipeQueryOptions, useRecipe } from '../../features/recipes/api/get-recipe';
import { noticeFromState, RecipeNoticeBanner } from '../../features/recipes/components/recipe-notice';
import { RecipePlanPanel } from '../../features/recipes/components/recipe-plan-panel';
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
        queryClient.ensureQueryData(recipeQueryOptions(kitchenId, params.recipeId ?? '')),
        queryClient.ensureQueryData(cannersQueryOptions(kitchenId)),
      ]),
    );
  };

function RecipePage({ kitchen }: { kitchen: KitchenView }) {
  const { recipeId = '' } = useParams();
  const recipe = useRecipe(kitchen.id, recipeId);
  const canners = useCanners(kitchen.id);
  const location = useLocation();
  const navigate = useNavigate();
  const [confirming, setConfirming] = useState(false);
  const remove = useDeleteRecipe(kitchen.id, { onSuccess: () => void navigate(paths.recipes(kitchen.id)) });
  const notice = noticeFromState(location.state);
  const back = { to: paths.recipes(kitchen.id), label: 'Recipe box' };

  if (recipe.isPending) return <Loading label="Loading the recipe" />;
  if (recipe.isError) {
    return (
      <>
        <PageHeader title="Recipe" back={back} />
        <RecipeLoadError kitchenId={kitchen.id} error={recipe.error} onRetry={() => void recipe.refetch()} />
      </>
    );
  }
  const lead = kitchen.role === 'lead';
  const plan = canners.isPending ? (
    <Loading label="Loading canners" />
  ) : canners.isError ? (
    <QueryError error={canners.error} onRetry={() => void canners.refetch()} />
  ) : (
    <RecipePlanPanel kitchen={kitchen} recipe={recipe.data} canners={canners.data} />
  );

  return (
    <>
      <PageHeader
        title={recipe.data.name}
        subtitle={kitchen.name}
        back={back}
        actions={
          lead ? (
            <Stack direction="row" spacing={1.5}>
              <Button
                component={RouterLink}
                to={paths.editRecipe(kitchen.id, recipe.data.id)}
                variant="contained"
                startIcon={<Edit />}
              >
                Edit
              </Button>
              <Button
                variant="outlined"
                color="error"
                startIcon={<Delete />}
                onClick={() => {
                  remove.reset();
                  setConfirming(true);
                }}
              >
                Delete
              </Button>
            </Stack>
          ) : null
        }
      />
      {notice ? (
        <RecipeNoticeBanner notice={notice} onClose={() => void navigate('.', { replace: true, state: null })} />
      ) : null}
      <RecipeReadView kitchen={kitchen} recipe={recipe.data} canners={canners.data ?? []} plan={plan} />
      <AttachmentsPanel
        kitchenId={kitchen.id}
        role={kitchen.role}
        subject="recipe"
        subjectId={recipe.data.id}
        title="Photos and recipe cards"
      />
      <ConfirmDialog
        open={confirming}
        title={`Delete ${recipe.data.name}?`}
        confirmLabel="Delete recipe"
        pending={remove.isPending}
        error={remove.isError ? remove.error.message : null}
        onClose={() => setConfirming(false)}
        onConfirm={() => remove.mutate(recipe.data.id)}
      >
        The recipe leaves this kitchen&apos;s recipe box. This cannot be undone.
      </ConfirmDialog>
    </>
  );
}

export default function RecipeRoute() {
  return <WithKitchen>{(kitchen) => <RecipePage kitchen={kitchen} />}</WithKitchen>;
}
