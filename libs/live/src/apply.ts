import { applyBoilingWater } from './boiling-water.js';
import { commandContextSchema, timerCommandSchema } from './commands.js';
import type { CommandContext, TimerCommand, TimerResult } from './commands.js';
import type { TimerEvent } from './events.js';
import { changed, commit, describeIssue, refuse, STOPPED, timerEvent, unchanged } from './internal.js';
import { applyPressure } from './pressure.js';
import { settleRaw } from './schedule.js';
import { applySimple } from './simple-timer.js';
import { isTerminal, type Timer } from './timer.js';

/** Cancel stops any clock; an alarm still sounding is silenced by the same person, since they have acted. */
function cancel(t: Timer, ctx: CommandContext): TimerResult {
  if (t.state === 'cancelled') return unchanged(t);
  if (isTerminal(t)) return refuse('invalid_state', 'The timer has already finished.');
  const alarmOpen = t.alarm !== null && t.alarm.acknowledgedAt === undefined;
  const after: Timer = {
    ...t,
    ...STOPPED,
    state: 'cancelled',
    alarm: alarmOpen && t.alarm ? { ...t.alarm, acknowledgedAt: ctx.now, acknowledgedBy: ctx.actorId } : t.alarm,
  };
  const events: TimerEvent[] = [timerEvent('timer.cancelled', t, after, ctx.now)];
  if (alarmOpen) events.push(timerEvent('alarm.acknowledged', after, after, ctx.now, { alarmReason: t.alarm?.reason }));
  return changed(after, events);
}

/** The first acknowledgement counts; later ones succeed without changing who or when. */
function acknowledge(t: Timer, ctx: CommandContext): TimerResult {
  if (t.alarm === null) return refuse('no_alarm', 'There is no alarm to acknowledge on this timer.');
  if (t.alarm.acknowledgedAt !== undefined) return unchanged(t);
  const after: Timer = { ...t, alarm: { ...t.alarm, acknowledgedAt: ctx.now, acknowledgedBy: ctx.actorId } };
  return changed(after, [timerEvent('alarm.acknowledged', t, after, ctx.now, { alarmReason: t.alarm.reason })]);
}

function dispatch(t: Timer, command: TimerCommand, ctx: CommandContext): TimerResult {
  if (command.type === 'cancel') return cancel(t, ctx);
  if (command.type === 'acknowledge') return acknowledge(t, ctx);
  if (t.kind === 'process') return applyBoilingWater(t, command, ctx);
  if (t.kind === 'pressure-process') return applyPressure(t, command, ctx);
  return applySimple(t, command, ctx);
}

/**
 * Apply one person's command to a timer at server time `ctx.now`. Pure: the same timer, command and context always
 * give the same answer.
 *
 * - Watchers never command (`forbidden`). The command is checked against `timerCommandSchema` (`invalid_input`).
 * - Anything that came due by `now` fires first (with its alarm and `lateByMs`), so a command never acts on a clock
 *   that has already run out; those events lead the answer's `events`. If the command is then refused, nothing is
 *   returned for the firing: the server's own timeout fires it.
 * - Same intent, same state: a command whose intent the timer already shows answers success with `noop: true`, no
 *   events of its own, and the current timer. So two helpers pressing "Rolling boil" together start ONE process
 *   clock, and the second press never restarts it. The pairs: start/resume/rolling-boil/at-pressure on a running
 *   clock, pause on paused, water-heating on waiting-for-boil, start-venting on venting, heat-off on cooling-down,
 *   gauge-zero on opening-wait, cancel on cancelled, acknowledge on an acknowledged alarm, set-duration to the same
 *   time, and boil-lost (pressure-lost) on a timer already waiting again after a loss. "Add time" always adds: a
 *   doubled tap is caught by its command id (`decideCommand`), not here.
 * - Illegal transitions are refused (`invalid_state`, `wrong_kind`) with a sentence a person can act on.
 */
export function applyTimerCommand(timer: Timer, command: TimerCommand, ctx: CommandContext): TimerResult {
  const context = commandContextSchema.safeParse(ctx);
  if (!context.success) return refuse('forbidden', 'The command has no valid actor.');
  if (ctx.actorRole === 'watcher') {
    return refuse('forbidden', 'Watchers follow the board; only a lead or a helper can run the timers.');
  }
  const parsed = timerCommandSchema.safeParse(command);
  if (!parsed.success) return refuse('invalid_input', describeIssue(parsed.error));

  const settled = settleRaw(timer, ctx.now);
  const result = dispatch(settled.timer, parsed.data, ctx);
  if (!result.ok) return result;
  const events = [...settled.events, ...result.events];
  return commit(timer, { ...result, events }, ctx.now);
}
