import type { CommandContext, LeadOverride, TimerResult } from './commands.js';
import type { TimerEvent } from './events.js';
import { formatDuration } from './format.js';
import { changed, refuse, timerEvent, unchanged } from './internal.js';
import { checkMinimum } from './minimum-gate.js';
import type { Timer, TimerState } from './timer.js';

/** States in which a process time may still change: until the load has had its time. */
const CHANGEABLE: readonly TimerState[] = ['armed', 'waiting-for-boil', 'venting', 'coming-up', 'running'];

/**
 * Change a process time. While the load processes, the deadline moves with it (counted from the boil or from
 * reaching pressure); the new time must still lie ahead. Below the tested time only with a lead's override.
 */
export function setProcessDuration(
  t: Timer,
  durationMs: number,
  override: LeadOverride | undefined,
  ctx: CommandContext,
): TimerResult {
  if (!CHANGEABLE.includes(t.state)) {
    return refuse('invalid_state', 'The process time can only change before the load has finished processing.');
  }
  if (durationMs === t.durationMs) return unchanged(t);
  const counted = t.state === 'running' && t.phaseStartedAt !== null ? ctx.now - t.phaseStartedAt : 0;
  if (t.state === 'running' && durationMs <= counted) {
    return refuse(
      'invalid_input',
      `The load has already processed ${formatDuration(counted)}; a new process time must be longer than that.`,
    );
  }
  const gate = checkMinimum(t.kind, durationMs, t.minimumMs, override, ctx);
  if (!gate.ok) return gate;
  const after: Timer = {
    ...t,
    durationMs,
    deadlineAt: t.state === 'running' && t.phaseStartedAt !== null ? t.phaseStartedAt + durationMs : t.deadlineAt,
    overrides: gate.override ? [...t.overrides, gate.override] : t.overrides,
  };
  const events: TimerEvent[] = [
    timerEvent('timer.duration-set', t, after, ctx.now, {
      durationMs,
      previousDurationMs: t.durationMs,
      deadlineAt: t.state === 'running' ? (after.deadlineAt ?? undefined) : undefined,
    }),
  ];
  if (gate.override) {
    const { reason, minimumMs } = gate.override;
    events.push(timerEvent('timer.override', after, after, ctx.now, { reason, durationMs, minimumMs }));
  }
  return changed(after, events);
}
