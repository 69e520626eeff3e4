import type { CommandContext, TimerCommand, TimerResult } from './commands.js';
import { MAX_DURATION_MS } from './constants.js';
import { formatDuration } from './format.js';
import { CANCELLED_MESSAGE, changed, counting, refuse, STOPPED, timerEvent, unchanged, wrongKind } from './internal.js';
import { ADJUSTABLE_KINDS, type Timer } from './timer.js';

const isAdjustable = (t: Timer) => (ADJUSTABLE_KINDS as readonly string[]).includes(t.kind);

function notRunningMessage(t: Timer): string {
  if (t.state === 'done') return 'The timer has already finished; start a new one if more time is needed.';
  if (t.state === 'cancelled') return CANCELLED_MESSAGE;
  if (t.state === 'ready') return 'The timer has not been started yet.';
  return 'The timer is paused: resume it first.';
}

function start(t: Timer, now: number): TimerResult {
  if (t.state === 'running') return unchanged(t);
  if (t.state !== 'ready') return refuse('invalid_state', notRunningMessage(t));
  const after: Timer = { ...t, state: 'running', ...counting(now, t.durationMs) };
  return changed(after, [timerEvent('timer.started', t, after, now, { deadlineAt: after.deadlineAt ?? undefined })]);
}

function pause(t: Timer, now: number): TimerResult {
  if (t.state === 'paused') return unchanged(t);
  if (t.state !== 'running' || t.deadlineAt === null) return refuse('invalid_state', notRunningMessage(t));
  const remaining = Math.max(0, t.deadlineAt - now);
  const after: Timer = { ...t, state: 'paused', ...STOPPED, pausedRemainingMs: remaining };
  return changed(after, [timerEvent('timer.paused', t, after, now, { remainingMs: remaining })]);
}

function resume(t: Timer, now: number): TimerResult {
  if (t.state === 'running') return unchanged(t);
  if (t.state !== 'paused') return refuse('invalid_state', 'Only a paused timer can be resumed.');
  const after: Timer = { ...t, state: 'running', ...counting(now, t.pausedRemainingMs ?? 0) };
  return changed(after, [timerEvent('timer.resumed', t, after, now, { deadlineAt: after.deadlineAt ?? undefined })]);
}

/** Extra time lengthens the timer wherever it stands: its full time, and its clock if one counts or is paused. */
function addTime(t: Timer, addMs: number, now: number): TimerResult {
  if (t.state !== 'ready' && t.state !== 'running' && t.state !== 'paused') {
    return refuse('invalid_state', notRunningMessage(t));
  }
  if (t.durationMs + addMs > MAX_DURATION_MS) {
    return refuse('invalid_input', `A timer runs at most ${formatDuration(MAX_DURATION_MS)}.`);
  }
  const after: Timer = {
    ...t,
    durationMs: t.durationMs + addMs,
    deadlineAt: t.deadlineAt === null ? null : t.deadlineAt + addMs,
    pausedRemainingMs: t.pausedRemainingMs === null ? null : t.pausedRemainingMs + addMs,
  };
  const detail = { addedMs: addMs, durationMs: after.durationMs, deadlineAt: after.deadlineAt ?? undefined };
  return changed(after, [timerEvent('timer.time-added', t, after, now, detail)]);
}

/**
 * Blanch, simmer, hot-hold and custom timers: ready -> running -> done, with pause, resume and extra time. Canner
 * and cooling rests only start (their time is a minimum to wait, not something to stretch or stop).
 */
export function applySimple(t: Timer, command: TimerCommand, ctx: CommandContext): TimerResult {
  switch (command.type) {
    case 'start':
      return start(t, ctx.now);
    case 'pause':
    case 'resume':
    case 'add-time':
      if (!isAdjustable(t)) {
        return wrongKind(
          command.type,
          t.kind,
          ' A rest is the least time to wait: cancel it and start anew if needed.',
        );
      }
      if (command.type === 'pause') return pause(t, ctx.now);
      if (command.type === 'resume') return resume(t, ctx.now);
      return addTime(t, command.addMs, ctx.now);
    default:
      return wrongKind(command.type, t.kind);
  }
}
