import { useSyncExternalStore } from 'react';

/** Ten looks a second: the digits turn within a tenth of a second of the true boundary on every device. */
const TICK_MS = 100;
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
 * A value computed from the clock, re-read at every tick. React re-renders the caller only when the value changes
 * (a primitive compared with Object.is), so a countdown re-renders once a second and nothing around it does.
 */
export function useTicking<T extends string | number | boolean>(compute: () => T): T {
  return useSyncExternalStore(subscribe, compute, compute);
}
