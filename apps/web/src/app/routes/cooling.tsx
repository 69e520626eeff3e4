import Inventory2 from '@mui/icons-material/Inventory2';
import type { KitchenView } from '@jarday/contracts';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { Link as RouterLink, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '../../components/ui/page-header';
import { Loading, QueryError } from '../../components/ui/query-state';
import { paths } from '../../config/paths';
import { cannersQueryOptions, useCanners } from '../../features/canners/api/get-canners';
import { coolingShelfQueryOptions, useCoolingShelf } from '../../features/cooling/api/get-cooling-shelf';
import { CoolingShelf } from '../../features/cooling/components/cooling-shelf';
import { dayPaths } from '../../features/day/utils/day-paths';
import { kitchenQueryOptions } from '../../features/kitchens/api/get-kitchen';
import { pantryKeys } from '../../features/pantry/api/pantry-keys';
import { ensureQuietly, WithKitchen } from './with-kitchen';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params, request }: LoaderFunctionArgs) => {
    const kitchenId = params.kitchenId ?? '';
    const dayId = new URL(request.url).searchParams.get('day') ?? undefined;
    return ensureQuietly(
      Promise.all([
        queryClient.ensureQueryData(kitchenQueryOptions(kitchenId)),
        queryClient.ensureQueryData(coolingShelfQueryOptions(kitchenId, dayId)),
        queryClient.ensureQueryData(cannersQueryOptions(kitchenId)),
      ]),
    );
  };

function CoolingPage({ kitchen }: { kitchen: KitchenView }) {
  const [search] = useSearchParams();
  const dayId = search.get('day') ?? undefined;
  const shelf = useCoolingShelf(kitchen.id, dayId);
  const canners = useCanners(kitchen.id);
  const queryClient = useQueryClient();

  return (
    <>
      <PageHeader
        title="Cooling shelf"
        subtitle={kitchen.name}
        back={{ to: paths.kitchen(kitchen.id), label: kitchen.name }}
        actions={
          <Stack direction="row" spacing={1.5} sx={{ flexWrap: 'wrap', gap: 1.5 }}>
            {dayId ? (
              <Button component={RouterLink} to={paths.cooling(kitchen.id)} variant="outlined">
                Every load on the shelf
              </Button>
            ) : null}
            <Button component={RouterLink} to={paths.pantry(kitchen.id)} variant="contained" startIcon={<Inventory2 />}>
              Pantry
            </Button>
          </Stack>
        }
      />
      {shelf.isPending ? (
        <Loading label="Loading the cooling shelf" />
      ) : shelf.isError ? (
        <QueryError error={shelf.error} onRetry={() => void shelf.refetch()} />
      ) : (
        <Stack spacing={2}>
          <Typography sx={{ color: 'text.secondary', fontSize: '1rem' }} aria-live="polite">
            Checked with the server at{' '}
            {new Date(shelf.dataUpdatedAt).toLocaleTimeString(undefined, { timeStyle: 'short' })}; it looks again every
            half minute.
          </Typography>
          <CoolingShelf
            kitchenId={kitchen.id}
            role={kitchen.role}
            shelf={shelf.data}
            canners={canners.data ?? []}
            boardPath={(id) => dayPaths.board(kitchen.id, id)}
            onJarsChanged={() => void queryClient.invalidateQueries({ queryKey: pantryKeys.kitchen(kitchen.id) })}
          />
        </Stack>
      )}
    </>
  );
}

/** /kitchens/:kitchenId/cooling[?day=]: loads cooling, when their bands may come off, and the seal checks. */
export default function CoolingRoute() {
  return <WithKitchen>{(kitchen) => <CoolingPage kitchen={kitchen} />}</WithKitchen>;
}
