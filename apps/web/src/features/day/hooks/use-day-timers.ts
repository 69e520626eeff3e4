import type { Timer } from '@jarday/contracts';
import { useMemo } from 'react';
import { sortedTimers, useLiveStore } from '../stores/live-store';
import { alarmIsOn } from '../utils/timer-actions';

/** The day's timers (oldest first) and those whose alarm is up; recomputed only when a timer changes. */
export function useDayTimers(): { timers: Timer[]; alarms: Timer[] } {
  const byId = useLiveStore((s) => s.timers);
  return useMemo(() => {
    const timers = sortedTimers(byId);
    return { timers, alarms: timers.filter(alarmIsOn) };
  }, [byId]);
}
