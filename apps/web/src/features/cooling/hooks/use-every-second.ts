import { useSyncExternalStore } from 'react';

/** The shelf counts in minutes; a look each second turns the text within a second of the true boundary. */
const TICK_MS = 1000;
const listeners = new Set<() => void>();
let interval: ReturnType<typeof setInterval> | undefined;

function subscribe(listener: () => void): () => void {
  listeners.add(listener);
  interval ??= setInterval(() => {
    for (const l of listeners) l();
  }, TICK_MS);
  return () => {
    listeners.delete(listener);
    if (listeners.size === 0) {
      clearInterval(interval);
      interval = undefined;
    }
  };
}

/**
 * A value computed from the clock, re-read every second. The caller re-renders only when the value changes (a
 * primitive compared with Object.is), so a countdown in minutes re-renders once a minute.
 */
export function useEverySecond<T extends string | number | boolean>(compute: () => T): T {
  return useSyncExternalStore(subscribe, compute, compute);
}
