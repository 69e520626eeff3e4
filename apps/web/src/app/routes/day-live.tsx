import type { DayView, KitchenView } from '@jarday/contracts';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import type { QueryClient } from '@tanstack/react-query';
import { useEffect, type ReactNode } from 'react';
import { Link as RouterLink, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { Loading, QueryError } from '../../components/ui/query-state';
import { useSessionStore } from '../../features/auth/stores/session-store';
import { renewSession } from '../../features/auth/utils/session';
import { dayQueryOptions, useDay } from '../../features/day/api/get-day';
import { dayPaths } from '../../features/day/utils/day-paths';
import { kitchenQueryOptions } from '../../features/kitchens/api/get-kitchen';
import { ApiError } from '../../lib/api-client';
import type { LiveAuth } from '../../lib/socket';
import { ensureQuietly, WithKitchen } from './with-kitchen';

/**
 * The live socket's view of the session: the token the session store holds, its renewal, and a call whenever the
 * store gets a new token (the socket then sends `session:renew` without reconnecting). One object for the app.
 */
export const sessionLiveAuth: LiveAuth = {
  getToken: () => useSessionStore.getState().accessToken,
  renew: renewSession,
  onToken: (listener) =>
    useSessionStore.subscribe((state, previous) => {
      if (state.accessToken !== previous.accessToken) listener(state.accessToken);
    }),
};

/** Warms the kitchen and the day before a day page renders. */
export const dayLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) =>
    ensureQuietly(
      Promise.all([
        queryClient.ensureQueryData(kitchenQueryOptions(params.kitchenId ?? '')),
        queryClient.ensureQueryData(dayQueryOptions(params.kitchenId ?? '', params.dayId ?? '')),
      ]),
    );

/** Loads the kitchen and the day named in the path; a day of another kitchen reads as not found. */
export function WithDay({ children }: { children: (kitchen: KitchenView, day: DayView) => ReactNode }) {
  const { kitchenId = '', dayId = '' } = useParams();
  const day = useDay(kitchenId, dayId);
  return (
    <WithKitchen>
      {(kitchen) => {
        if (day.isPending) return <Loading label="Loading the day" />;
        if (day.isError) {
          if (day.error instanceof ApiError && day.error.status === 404) {
            return (
              <Stack spacing={3}>
                <Alert severity="error">This canning day does not exist in {kitchen.name}.</Alert>
                <Button
                  component={RouterLink}
                  to={dayPaths.list(kitchen.id)}
                  variant="contained"
                  sx={{ alignSelf: 'flex-start' }}
                >
                  See the kitchen’s days
                </Button>
              </Stack>
            );
          }
          return <QueryError error={day.error} onRetry={() => void day.refetch()} />;
        }
        return children(kitchen, day.data);
      }}
    </WithKitchen>
  );
}

/** The tab's title while a live day is open, so a tablet's tab strip says which day it shows. */
export function useDocumentTitle(title: string): void {
  useEffect(() => {
    const before = document.title;
    document.title = title;
    return () => {
      document.title = before;
    };
  }, [title]);
}
