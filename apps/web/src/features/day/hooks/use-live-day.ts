import { useQueryClient } from '@tanstack/react-query';
import { useEffect } from 'react';
import { bindLiveAuth, getLiveSocket, type LiveAuth } from '../../../lib/socket';
import { dayKeys } from '../api/day-keys';
import { startLiveSync } from '../utils/live-sync';

/**
 * The one sync of a live day: the socket feeds the live store (timers, in `seq` order), and batch, load and day
 * changes refresh the day's REST view. `auth` must be a stable object (the route module's).
 */
export function useLiveDay(dayId: string, auth: LiveAuth): void {
  const queryClient = useQueryClient();
  useEffect(() => {
    const unbind = bindLiveAuth(auth);
    const stop = startLiveSync(dayId, {
      socket: getLiveSocket(),
      auth,
      onDayChanged: () => void queryClient.invalidateQueries({ queryKey: dayKeys.detail(dayId) }),
    });
    return () => {
      stop();
      unbind();
    };
  }, [dayId, auth, queryClient]);
}
