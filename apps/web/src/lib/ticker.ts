import { useSyncExternalStore } from 'react';

/**
 * A hook that re-reads a value computed from the clock every `tickMs`, all callers sharing one interval. React
 * re-renders a caller only when its value changes (a primitive compared with Object.is), so a countdown shown in
 * seconds re-renders once a second and nothing around it does.
 */
export function createTicker(tickMs: number): <T extends string | number | boolean>(compute: () => T) => T {
  const listeners = new Set<() => void>();
  let interval: ReturnType<typeof setInterval> | undefined;

  function subscribe(listener: () => void): () => void {
    listeners.add(listener);
    interval ??= setInterval(() => {
      for (const l of listeners) l();
    }, tickMs);
    return () => {
      listeners.delete(listener);
      if (listeners.size === 0) {
        clearInterval(interval);
        interval = undefined;
      }
    };
  }

  return function useTicker<T extends string | number | boolean>(compute: () => T): T {
    return useSyncExternalStore(subscribe, compute, compute);
  };
}
