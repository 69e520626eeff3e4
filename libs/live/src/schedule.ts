import type { TimerResult } from './commands.js';
import type { TimerEvent } from './events.js';
import { formatDuration } from './format.js';
import { changed, commit, refuse, STOPPED, timerEvent } from './internal.js';
import type { AlarmReason, Timer, TimerState } from './timer.js';

/**
 * The one moment at which the server must look at this timer again, or null when nothing counts. Schedule exactly
 * one timeout per timer for it, and replace that timeout after every change (a stale one finds `not_due`).
 */
export function nextDeadline(timer: Timer): number | null {
  return timer.deadlineAt;
}

/** The timers whose deadline has come by `now`, earliest first: after a restart, fire these at once. */
export function dueTimers<T extends Timer>(timers: readonly T[], now: number): T[] {
  return timers
    .filter((t) => t.deadlineAt !== null && t.deadlineAt <= now)
    .sort((a, b) => (a.deadlineAt ?? 0) - (b.deadlineAt ?? 0));
}

const WAITING_FULL_TIME: readonly TimerState[] = ['ready', 'armed', 'waiting-for-boil', 'coming-up'];

/**
 * The time the board shows, never negative: what is left of the clock now counting (the process, the vent or the
 * wait before opening); the time left when paused; the full time while a timer waits to start (ready, armed,
 * waiting for the boil, coming up to pressure); zero once the time is done. On a device pass `serverNow(...)`.
 */
export function remainingMs(timer: Timer, now: number): number {
  if (timer.deadlineAt !== null) return Math.max(0, timer.deadlineAt - now);
  if (timer.state === 'paused') return Math.max(0, timer.pausedRemainingMs ?? 0);
  if (WAITING_FULL_TIME.includes(timer.state)) return timer.durationMs;
  return 0;
}

const AFTER_DEADLINE: Partial<Record<TimerState, { to: TimerState; type: TimerEvent['type']; alarm: AlarmReason }>> = {
  running: { to: 'done', type: 'timer.done', alarm: 'done' },
  venting: { to: 'coming-up', type: 'timer.vented', alarm: 'vented' },
  'opening-wait': { to: 'finished', type: 'timer.finished', alarm: 'may-open' },
};

/** The firing itself, without the version stamp. */
export function fireRaw(timer: Timer, now: number): TimerResult {
  const dueAt = timer.deadlineAt;
  if (dueAt === null) return refuse('not_due', 'Nothing is counting on this timer.');
  if (now < dueAt) return refuse('not_due', `The timer is not due yet: ${formatDuration(dueAt - now)} to go.`);
  const next = AFTER_DEADLINE[timer.state];
  if (!next) return refuse('not_due', 'Nothing is counting on this timer.');
  const lateByMs = now - dueAt;
  const after: Timer = {
    ...timer,
    ...STOPPED,
    state: next.to,
    doneAt: timer.state === 'running' ? dueAt : timer.doneAt,
    lateByMs,
    alarm: { reason: next.alarm, raisedAt: now },
  };
  return changed(after, [
    timerEvent(next.type, timer, after, now, { dueAt, lateByMs }),
    timerEvent('alarm.raised', after, after, now, { alarmReason: next.alarm }),
  ]);
}

/**
 * Fire a timer whose deadline has come: a running clock ends (`done`, or for a pressure canner `coming-up` after the
 * vent and `finished` after the wait before opening), an alarm is raised, and `lateByMs = now - deadline` records how
 * late the server was (for instance when it was down). Refuses with `not_due` before the deadline.
 */
export function fireDue(timer: Timer, now: number): TimerResult {
  return commit(timer, fireRaw(timer, now), now);
}

/** Fire everything due by `now` (at most one firing per phase), without the version stamp. */
export function settleRaw(timer: Timer, now: number): { timer: Timer; events: TimerEvent[] } {
  let current = timer;
  const events: TimerEvent[] = [];
  // Each firing stops the clock or moves to an untimed phase, so this runs at most once per timed phase.
  for (let i = 0; i < 3 && current.deadlineAt !== null && current.deadlineAt <= now; i += 1) {
    const fired = fireRaw(current, now);
    if (!fired.ok) break;
    current = fired.timer;
    events.push(...fired.events);
  }
  return { timer: current, events };
}

/**
 * Bring a stored timer up to `now`: fire whatever came due while nobody looked (after a restart, say). Returns the
 * timer unchanged with no events when nothing was due.
 */
export function settle(timer: Timer, now: number): { timer: Timer; events: TimerEvent[] } {
  const { timer: after, events } = settleRaw(timer, now);
  return events.length === 0
    ? { timer, events }
    : { timer: { ...after, version: timer.version + 1, updatedAt: now }, events };
}
