import { remainingMs, serverNow, type Timer } from '@jarday/live';

/**
 * The big digits: "9:58", "0:07", "1:29:59". Whole seconds rounded up, as on a kitchen timer: the display reads
 * 0:00 only once the time is really up.
 */
export function formatClock(ms: number): string {
  const total = Math.ceil(Math.max(0, ms) / 1000);
  const h = Math.floor(total / 3600);
  const m = Math.floor((total % 3600) / 60);
  const s = total % 60;
  const ss = String(s).padStart(2, '0');
  return h > 0 ? `${h}:${String(m).padStart(2, '0')}:${ss}` : `${m}:${ss}`;
}

/** What is left on a timer at this device's moment, in server time. */
export const leftOn = (timer: Timer, deviceNow: number, offsetMs: number) =>
  remainingMs(timer, serverNow(deviceNow, offsetMs));

/**
 * How far along the counting phase is, 0 to 1: exactly its own span (from `phaseStartedAt` to `deadlineAt`, so a
 * vent or the wait after zero measures itself, not the process time); paused and waiting timers by their full time.
 */
export function progressOf(timer: Timer, deviceNow: number, offsetMs: number): number {
  const span =
    timer.deadlineAt !== null && timer.phaseStartedAt !== null
      ? timer.deadlineAt - timer.phaseStartedAt
      : timer.durationMs;
  if (span <= 0) return 1;
  const left = leftOn(timer, deviceNow, offsetMs);
  return Math.min(1, Math.max(0, 1 - left / span));
}
