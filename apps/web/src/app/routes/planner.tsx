import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import type { QueryClient } from '@tanstack/react-query';
import { Link as RouterLink, useNavigate, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '../../components/ui/page-header';
import { Loading, QueryError } from '../../components/ui/query-state';
import { paths } from '../../config/paths';
import { cannersQueryOptions, useCanners } from '../../features/canners/api/get-canners';
import { dayPaths } from '../../features/day/utils/day-paths';
import { kitchenQueryOptions } from '../../features/kitchens/api/get-kitchen';
import { DayPlanner } from '../../features/planner/components/day-planner';
import { recipesQueryOptions, useRecipes } from '../../features/recipes/api/get-recipes';
import { ensureQuietly, WithKitchen } from './with-kitchen';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) =>
    ensureQuietly(
      Promise.all([
        queryClient.ensureQueryData(kitchenQueryOptions(params.kitchenId ?? '')),
        queryClient.ensureQueryData(recipesQueryOptions(params.kitchenId ?? '')),
        queryClient.ensureQueryData(cannersQueryOptions(params.kitchenId ?? '')),
      ]),
    );

/** Today on this device, and a morning start: the planner's first guess, changed in the form. */
function initialStart(now = new Date()) {
  const pad = (n: number) => String(n).padStart(2, '0');
  return { date: `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`, time: '08:00' };
}

function Planner({ kitchenId, canStart }: { kitchenId: string; canStart: boolean }) {
  const navigate = useNavigate();
  const recipes = useRecipes(kitchenId);
  const canners = useCanners(kitchenId);
  if (recipes.isPending || canners.isPending) return <Loading label="Loading recipes and canners" />;
  if (recipes.isError) return <QueryError error={recipes.error} onRetry={() => void recipes.refetch()} />;
  if (canners.isError) return <QueryError error={canners.error} onRetry={() => void canners.refetch()} />;
  if (recipes.data.length === 0 || canners.data.length === 0) {
    return (
      <Stack spacing={2}>
        <Alert severity="info">
          To plan a day the kitchen needs at least one recipe in its Recipe box and one canner in its settings.
        </Alert>
        <Stack direction="row" spacing={2}>
          <Button component={RouterLink} to={paths.recipes(kitchenId)} variant="outlined">
            Recipe box
          </Button>
          <Button component={RouterLink} to={paths.settings(kitchenId)} variant="outlined">
            Canners
          </Button>
        </Stack>
      </Stack>
    );
  }
  return (
    <DayPlanner
      kitchenId={kitchenId}
      canStart={canStart}
      recipes={recipes.data}
      canners={canners.data}
      initial={initialStart()}
      onStarted={(day) => void navigate(dayPaths.board(kitchenId, day.id))}
    />
  );
}

/** /kitchens/:kitchenId/plan: the Day planner. Starting the plan opens the day's Counter board. */
export default function PlannerRoute() {
  return (
    <WithKitchen>
      {(kitchen) => (
        <Stack spacing={3}>
          <PageHeader
            title="Plan a canning day"
            subtitle={kitchen.name}
            back={{ to: dayPaths.list(kitchen.id), label: 'Canning days' }}
          />
          <Planner kitchenId={kitchen.id} canStart={kitchen.role === 'lead'} />
        </Stack>
      )}
    </WithKitchen>
  );
}
