import Add from '@mui/icons-material/Add';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import type { QueryClient } from '@tanstack/react-query';
import { Link as RouterLink, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '../../components/ui/page-header';
import { Loading, QueryError } from '../../components/ui/query-state';
import { paths } from '../../config/paths';
import { daysQueryOptions, useDays } from '../../features/day/api/get-days';
import { DayList } from '../../features/day/components/day-list';
import { dayPaths } from '../../features/day/utils/day-paths';
import { kitchenQueryOptions } from '../../features/kitchens/api/get-kitchen';
import { ensureQuietly, WithKitchen } from './with-kitchen';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) =>
    ensureQuietly(
      Promise.all([
        queryClient.ensureQueryData(kitchenQueryOptions(params.kitchenId ?? '')),
        queryClient.ensureQueryData(daysQueryOptions(params.kitchenId ?? '')),
      ]),
    );

function Days({ kitchenId }: { kitchenId: string }) {
  const days = useDays(kitchenId);
  if (days.isPending) return <Loading label="Loading the days" />;
  if (days.isError) return <QueryError error={days.error} onRetry={() => void days.refetch()} />;
  return <DayList days={days.data} />;
}

/** /kitchens/:kitchenId/days: the kitchen's canning days, open ones first, and a new one for a lead. */
export default function DaysRoute() {
  return (
    <WithKitchen>
      {(kitchen) => (
        <Stack spacing={2}>
          <PageHeader
            title="Canning days"
            back={{ to: paths.kitchen(kitchen.id), label: kitchen.name }}
            actions={
              kitchen.role === 'lead' ? (
                <Button component={RouterLink} to={dayPaths.start(kitchen.id)} variant="contained" startIcon={<Add />}>
                  Start a canning day
                </Button>
              ) : null
            }
          />
          <Days kitchenId={kitchen.id} />
        </Stack>
      )}
    </WithKitchen>
  );
}
