import Add from '@mui/icons-material/Add';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { QueryClient } from '@tanstack/react-query';
import { Link as RouterLink, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '../../components/ui/page-header';
import { Loading, QueryError } from '../../components/ui/query-state';
import { paths } from '../../config/paths';
import { daysQueryOptions, useDays } from '../../features/day/api/get-days';
import { DayList } from '../../features/day/components/day-list';
import { dayPaths } from '../../features/day/utils/day-paths';
import { pastDaysQueryOptions, usePastDays } from '../../features/journal/api/journal-api';
import { PastDayList } from '../../features/journal/components/past-day-list';
import { kitchenQueryOptions } from '../../features/kitchens/api/get-kitchen';
import { ensureQuietly, WithKitchen } from './with-kitchen';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) =>
    ensureQuietly(
      Promise.all([
        queryClient.ensureQueryData(kitchenQueryOptions(params.kitchenId ?? '')),
        queryClient.ensureQueryData(daysQueryOptions(params.kitchenId ?? '')),
        queryClient.ensureQueryData(pastDaysQueryOptions(params.kitchenId ?? '')),
      ]),
    );

/** Open days as the day feature lists them; closed days with their figures and their journal. */
function Days({ kitchenId }: { kitchenId: string }) {
  const days = useDays(kitchenId);
  const past = usePastDays(kitchenId);
  if (days.isPending) return <Loading label="Loading the days" />;
  if (days.isError) return <QueryError error={days.error} onRetry={() => void days.refetch()} />;
  const closed = past.data?.filter((d) => d.status === 'closed') ?? [];
  return (
    <Stack spacing={3}>
      <DayList days={days.data.filter((d) => d.status === 'open')} />
      <Stack component="section" spacing={2} aria-labelledby="past-days">
        <Typography id="past-days" variant="h2">
          Past days
        </Typography>
        {past.isError ? <QueryError error={past.error} onRetry={() => void past.refetch()} /> : null}
        {past.isPending ? (
          <Loading label="Loading the past days" />
        ) : (
          <PastDayList
            days={closed}
            journalHref={(d) => paths.journal(kitchenId, d.id)}
            planHref={(d) => dayPaths.plan(kitchenId, d.id)}
          />
        )}
      </Stack>
    </Stack>
  );
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
          <Button component={RouterLink} to={paths.planner(kitchen.id)} variant="outlined">
            Plan a day
          </Button>
          <Days kitchenId={kitchen.id} />
        </Stack>
      )}
    </WithKitchen>
  );
}
