import Kitchen from '@mui/icons-material/Kitchen';
import type { KitchenView } from '@jarday/contracts';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import type { QueryClient } from '@tanstack/react-query';
import { Link as RouterLink, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '../../components/ui/page-header';
import { Loading, QueryError } from '../../components/ui/query-state';
import { paths } from '../../config/paths';
import { kitchenQueryOptions } from '../../features/kitchens/api/get-kitchen';
import { lotsQueryOptions, useLots } from '../../features/pantry/api/get-lots';
import { pantrySummaryQueryOptions, usePantrySummary } from '../../features/pantry/api/get-pantry-summary';
import { LotList } from '../../features/pantry/components/lot-list';
import { PantrySummary } from '../../features/pantry/components/pantry-summary';
import { ensureQuietly, WithKitchen } from './with-kitchen';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    const kitchenId = params.kitchenId ?? '';
    return ensureQuietly(
      Promise.all([
        queryClient.ensureQueryData(kitchenQueryOptions(kitchenId)),
        queryClient.ensureQueryData(lotsQueryOptions(kitchenId)),
        queryClient.ensureQueryData(pantrySummaryQueryOptions(kitchenId)),
      ]),
    );
  };

function PantryPage({ kitchen }: { kitchen: KitchenView }) {
  const lots = useLots(kitchen.id);
  const summary = usePantrySummary(kitchen.id);
  return (
    <>
      <PageHeader
        title="Pantry"
        subtitle={kitchen.name}
        back={{ to: paths.kitchen(kitchen.id), label: kitchen.name }}
        actions={
          <Button component={RouterLink} to={paths.cooling(kitchen.id)} variant="outlined" startIcon={<Kitchen />}>
            Cooling shelf
          </Button>
        }
      />
      <Stack spacing={3}>
        {summary.data ? <PantrySummary summary={summary.data} /> : null}
        {lots.isPending ? (
          <Loading label="Loading the lots" />
        ) : lots.isError ? (
          <QueryError error={lots.error} onRetry={() => void lots.refetch()} />
        ) : lots.data.length === 0 ? (
          <Alert severity="info">
            No lots yet. A batch becomes a lot when the first seal of its jars is checked on the cooling shelf.
          </Alert>
        ) : (
          <LotList kitchenId={kitchen.id} lots={lots.data} />
        )}
      </Stack>
    </>
  );
}

/** /kitchens/:kitchenId/pantry: the lots, their jars on the shelf and best-quality dates. */
export default function PantryRoute() {
  return <WithKitchen>{(kitchen) => <PantryPage kitchen={kitchen} />}</WithKitchen>;
}
