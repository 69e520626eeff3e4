import type { CommandContext, TimerCommand, TimerResult } from './commands.js';
import { PRESSURE_OPENING_WAIT_MS, PRESSURE_VENT_MS } from './constants.js';
import { formatDuration } from './format.js';
import { CANCELLED_MESSAGE, changed, counting, refuse, STOPPED, timerEvent, unchanged, wrongKind } from './internal.js';
import { setProcessDuration } from './process-duration.js';
import type { Timer, TimerState } from './timer.js';

const NEVER_PAUSED =
  ' A pressure process is never paused: if the pressure falls, press "Pressure lost"; the full time starts again' +
  ' once the canner is back at pressure.';
const VENT = formatDuration(PRESSURE_VENT_MS);
const AFTER_PROCESS: readonly TimerState[] = ['done', 'cooling-down', 'opening-wait', 'finished'];

function laterMessage(t: Timer): string {
  if (t.state === 'cancelled') return CANCELLED_MESSAGE;
  if (t.state === 'finished') return 'This load is finished: the canner may be opened.';
  return 'The load has finished processing.';
}

function move(t: Timer, to: TimerState, clock: Partial<Timer>, type: Parameters<typeof timerEvent>[0], now: number) {
  const after: Timer = { ...t, ...STOPPED, ...clock, state: to };
  return changed(after, [timerEvent(type, t, after, now, { deadlineAt: after.deadlineAt ?? undefined })]);
}

/** Vent (exhaust steam) 10 minutes before closing the vent (USDA Guide 1). The vent is timed by the server. */
function startVenting(t: Timer, now: number): TimerResult {
  if (t.state === 'venting') return unchanged(t);
  if (t.state !== 'armed')
    return refuse('invalid_state', 'Venting comes first, before the canner comes up to pressure.');
  return move(t, 'venting', counting(now, PRESSURE_VENT_MS), 'timer.venting', now);
}

/** Timing starts when the dial reads the target pressure or the weight rocks, always with the full time. */
function atPressure(t: Timer, now: number): TimerResult {
  if (t.state === 'running') return unchanged(t);
  if (t.state === 'armed') return refuse('invalid_state', `Vent the canner for ${VENT} first, then close the vent.`);
  if (t.state === 'venting') {
    return refuse('invalid_state', `Let the canner vent the full ${VENT} before bringing it up to pressure.`);
  }
  if (t.state !== 'coming-up') return refuse('invalid_state', laterMessage(t));
  const after: Timer = { ...t, state: 'running', ...counting(now, t.durationMs) };
  const detail = { durationMs: t.durationMs, deadlineAt: after.deadlineAt ?? undefined };
  return changed(after, [timerEvent('timer.at-pressure', t, after, now, detail)]);
}

/**
 * If the pressure falls below the target, bring it back up and time the full process again from the beginning
 * (USDA Guide 1; from memory).
 */
function pressureLost(t: Timer, now: number): TimerResult {
  if (t.state === 'coming-up' && t.restarts > 0) return unchanged(t);
  if (t.state !== 'running') {
    return refuse('invalid_state', 'Pressure can only be lost while the load is processing at pressure.');
  }
  const lostAfterMs = t.phaseStartedAt === null ? 0 : Math.max(0, now - t.phaseStartedAt);
  const after: Timer = { ...t, state: 'coming-up', ...STOPPED, restarts: t.restarts + 1 };
  const detail = { lostAfterMs, restarts: after.restarts, durationMs: t.durationMs };
  return changed(after, [timerEvent('timer.pressure-lost', t, after, now, detail)]);
}

/** The pressure must fall to zero by itself: the cool-down is untimed and never hurried. */
function heatOff(t: Timer, now: number): TimerResult {
  if (t.state === 'cooling-down') return unchanged(t);
  if (t.state !== 'done') {
    if (AFTER_PROCESS.includes(t.state) || t.state === 'cancelled') return refuse('invalid_state', laterMessage(t));
    return refuse(
      'invalid_state',
      'The load has not had its full time at pressure yet: turn the heat off only once the time is done.',
    );
  }
  return move(t, 'cooling-down', {}, 'timer.heat-off', now);
}

/** Wait 10 minutes after the gauge reads zero before opening (USDA Guide, 2015; the 1994 text said 2 minutes). */
function gaugeZero(t: Timer, now: number): TimerResult {
  if (t.state === 'opening-wait') return unchanged(t);
  if (t.state === 'done') {
    return refuse('invalid_state', 'Turn the heat off first and let the pressure fall to zero by itself.');
  }
  if (t.state !== 'cooling-down') {
    if (AFTER_PROCESS.includes(t.state) || t.state === 'cancelled') return refuse('invalid_state', laterMessage(t));
    return refuse('invalid_state', 'The gauge reading zero only counts after the load has processed and cooled.');
  }
  return move(t, 'opening-wait', counting(now, PRESSURE_OPENING_WAIT_MS), 'timer.gauge-zero', now);
}

/**
 * A pressure process: armed -> venting (10 min) -> coming-up -> running -> done -> cooling-down -> opening-wait
 * (10 min) -> finished; back to coming-up with the full time whenever the pressure is lost.
 */
export function applyPressure(t: Timer, command: TimerCommand, ctx: CommandContext): TimerResult {
  switch (command.type) {
    case 'start-venting':
      return startVenting(t, ctx.now);
    case 'at-pressure':
      return atPressure(t, ctx.now);
    case 'pressure-lost':
      return pressureLost(t, ctx.now);
    case 'heat-off':
      return heatOff(t, ctx.now);
    case 'gauge-zero':
      return gaugeZero(t, ctx.now);
    case 'set-duration':
      return setProcessDuration(t, command.durationMs, command.override, ctx);
    case 'pause':
    case 'resume':
      return wrongKind(command.type, t.kind, NEVER_PAUSED);
    case 'add-time':
      return wrongKind(command.type, t.kind, ' Change a process time with "Set process time".');
    case 'start':
      return wrongKind(command.type, t.kind, ' A pressure process starts with venting.');
    default:
      return wrongKind(command.type, t.kind);
  }
}
