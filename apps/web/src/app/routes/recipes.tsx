import Add from '@mui/icons-material/Add';
import type { KitchenView } from '@jarday/contracts';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { QueryClient } from '@tanstack/react-query';
import { Link as RouterLink, useNavigate, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '../../components/ui/page-header';
import { Loading, QueryError } from '../../components/ui/query-state';
import { paths } from '../../config/paths';
import { kitchenQueryOptions } from '../../features/kitchens/api/get-kitchen';
import { recipesQueryOptions, useRecipes } from '../../features/recipes/api/get-recipes';
import { startersQueryOptions, useStarters } from '../../features/recipes/api/get-starters';
import { RecipeBoxCautions } from '../../features/recipes/components/recipe-cautions';
import { RecipeList } from '../../features/recipes/components/recipe-list';
import { Section } from '../../features/recipes/components/section';
import { StarterList } from '../../features/recipes/components/starter-list';
import { ensureQuietly, WithKitchen } from './with-kitchen';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    const kitchenId = params.kitchenId ?? '';
    return ensureQuietly(
      Promise.all([
        queryClient.ensureQueryData(kitchenQueryOptions(kitchenId)),
        queryClient.ensureQueryData(recipesQueryOptions(kitchenId)),
        queryClient.ensureQueryData(startersQueryOptions()),
      ]),
    );
  };

function RecipeBoxPage({ kitchen }: { kitchen: KitchenView }) {
  const lead = kitchen.role === 'lead';
  const recipes = useRecipes(kitchen.id);
  const starters = useStarters();
  const navigate = useNavigate();

  return (
    <>
      <PageHeader
        title="Recipe box"
        subtitle={kitchen.name}
        back={{ to: paths.kitchen(kitchen.id), label: kitchen.name }}
        actions={
          lead ? (
            <Button component={RouterLink} to={paths.newRecipe(kitchen.id)} variant="contained" startIcon={<Add />}>
              New recipe
            </Button>
          ) : null
        }
      />
      <Stack spacing={5}>
        <Section title="This kitchen's recipes">
          {recipes.isPending ? (
            <Loading label="Loading recipes" />
          ) : recipes.isError ? (
            <QueryError error={recipes.error} onRetry={() => void recipes.refetch()} />
          ) : (
            <RecipeList kitchenId={kitchen.id} recipes={recipes.data} />
          )}
        </Section>
        <Section title="Starter recipes">
          <Typography sx={{ color: 'text.secondary' }}>
            Written from the published USDA and NCHFP tables.{' '}
            {lead
              ? 'Copy one into this kitchen to plan with it and add your own notes.'
              : 'A lead can copy one into this kitchen.'}
          </Typography>
          {starters.isPending ? (
            <Loading label="Loading starter recipes" />
          ) : starters.isError ? (
            <QueryError error={starters.error} onRetry={() => void starters.refetch()} />
          ) : (
            <StarterList
              kitchenId={kitchen.id}
              starters={starters.data}
              canCopy={lead}
              onCopied={(recipe) =>
                void navigate(paths.recipe(kitchen.id, recipe.id), { state: { notice: { kind: 'copied' } } })
              }
            />
          )}
        </Section>
        <RecipeBoxCautions />
      </Stack>
    </>
  );
}

export default function RecipesRoute() {
  return <WithKitchen>{(kitchen) => <RecipeBoxPage kitchen={kitchen} />}</WithKitchen>;
}
