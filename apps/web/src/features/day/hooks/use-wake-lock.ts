import { useEffect, useState } from 'react';

export type WakeLockState = 'held' | 'unsupported' | 'refused';

/**
 * Keeps the tablet's screen on while the board is open (Screen Wake Lock API). The browser drops the lock whenever
 * the page is hidden, so it is asked for again each time the page becomes visible.
 */
export function useWakeLock(): WakeLockState {
  const [state, setState] = useState<WakeLockState>(() => ('wakeLock' in navigator ? 'refused' : 'unsupported'));

  useEffect(() => {
    if (!('wakeLock' in navigator)) return;
    let sentinel: WakeLockSentinel | null = null;
    let stopped = false;
    const acquire = async () => {
      if (document.visibilityState !== 'visible' || (sentinel && !sentinel.released)) return;
      try {
        sentinel = await navigator.wakeLock.request('screen');
        if (stopped) return void sentinel.release();
        setState('held');
        sentinel.addEventListener('release', () => {
          if (!stopped) setState('refused');
        });
      } catch {
        setState('refused');
      }
    };
    const onVisible = () => void acquire();
    void acquire();
    document.addEventListener('visibilitychange', onVisible);
    return () => {
      stopped = true;
      document.removeEventListener('visibilitychange', onVisible);
      void sentinel?.release();
    };
  }, []);

  return state;
}
