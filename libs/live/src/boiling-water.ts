import type { CommandContext, TimerCommand, TimerResult } from './commands.js';
import { CANCELLED_MESSAGE, changed, counting, refuse, STOPPED, timerEvent, unchanged, wrongKind } from './internal.js';
import { setProcessDuration } from './process-duration.js';
import type { Timer } from './timer.js';

const NEVER_PAUSED =
  ' A process is never paused: if the boil stops, press "Boil lost"; the full time starts again at the next' +
  ' rolling boil.';

function laterMessage(t: Timer): string {
  return t.state === 'cancelled' ? CANCELLED_MESSAGE : 'The load has finished processing.';
}

function waterHeating(t: Timer, now: number): TimerResult {
  if (t.state === 'waiting-for-boil') return unchanged(t);
  if (t.state === 'running') return refuse('invalid_state', 'The load is already processing at a rolling boil.');
  if (t.state !== 'armed') return refuse('invalid_state', laterMessage(t));
  const after: Timer = { ...t, state: 'waiting-for-boil' };
  return changed(after, [timerEvent('timer.heating', t, after, now)]);
}

/** Timing starts only from a full rolling boil that a person has seen, and always with the full time. */
function rollingBoil(t: Timer, now: number): TimerResult {
  if (t.state === 'running') return unchanged(t);
  if (t.state === 'armed') {
    return refuse('invalid_state', 'Put the lid on and heat the water first, then confirm the rolling boil.');
  }
  if (t.state !== 'waiting-for-boil') return refuse('invalid_state', laterMessage(t));
  const after: Timer = { ...t, state: 'running', ...counting(now, t.durationMs) };
  const detail = { durationMs: t.durationMs, deadlineAt: after.deadlineAt ?? undefined };
  return changed(after, [timerEvent('timer.boil-confirmed', t, after, now, detail)]);
}

/**
 * If the water stops boiling, bring it back to a rolling boil and time the full process again from the beginning
 * (USDA Complete Guide to Home Canning, Guide 1, 2015). Nothing of the lost run counts.
 */
function boilLost(t: Timer, now: number): TimerResult {
  // A second press for the same loss finds the timer already waiting again after a loss.
  if (t.state === 'waiting-for-boil' && t.restarts > 0) return unchanged(t);
  if (t.state !== 'running') {
    return refuse('invalid_state', 'The boil can only be lost while the load is processing.');
  }
  const lostAfterMs = t.phaseStartedAt === null ? 0 : Math.max(0, now - t.phaseStartedAt);
  const after: Timer = { ...t, state: 'waiting-for-boil', ...STOPPED, restarts: t.restarts + 1 };
  const detail = { lostAfterMs, restarts: after.restarts, durationMs: t.durationMs };
  return changed(after, [timerEvent('timer.boil-lost', t, after, now, detail)]);
}

/** A boiling-water process: armed -> waiting-for-boil -> running -> done, back to waiting on a lost boil. */
export function applyBoilingWater(t: Timer, command: TimerCommand, ctx: CommandContext): TimerResult {
  switch (command.type) {
    case 'water-heating':
      return waterHeating(t, ctx.now);
    case 'rolling-boil':
      return rollingBoil(t, ctx.now);
    case 'boil-lost':
      return boilLost(t, ctx.now);
    case 'set-duration':
      return setProcessDuration(t, command.durationMs, command.override, ctx);
    case 'pause':
    case 'resume':
      return wrongKind(command.type, t.kind, NEVER_PAUSED);
    case 'add-time':
      return wrongKind(command.type, t.kind, ' Change a process time with "Set process time".');
    case 'start':
      return wrongKind(command.type, t.kind, ' A process starts from a confirmed rolling boil.');
    default:
      return wrongKind(command.type, t.kind);
  }
}
