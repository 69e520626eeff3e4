import { useEffect } from 'react';
import { preloadSound, setAlarmSounding } from '../utils/alarm-sound';

/** A buzz pattern a pocket will feel: long, short gap, long, repeated while the alarm stands. */
const BUZZ = [500, 250, 500];
const BUZZ_EVERY_MS = 2_000;

/** Sound (looping until acknowledged) and, on phones, vibration while any alarm of the day is up. */
export function useAlarmAlert(active: boolean): void {
  useEffect(() => preloadSound(), []);

  useEffect(() => {
    void setAlarmSounding(active);
  }, [active]);

  useEffect(() => () => void setAlarmSounding(false), []);

  useEffect(() => {
    if (!active || typeof navigator.vibrate !== 'function') return;
    const buzz = () => navigator.vibrate(BUZZ);
    buzz();
    const id = setInterval(buzz, BUZZ_EVERY_MS);
    return () => {
      clearInterval(id);
      navigator.vibrate(0);
    };
  }, [active]);
}
