import { commandContextSchema, newTimerSchema } from './commands.js';
import type { CreateContext, NewTimer, TimerResult } from './commands.js';
import { CANNER_REST_MS, COOLING_REST_MS } from './constants.js';
import type { TimerEvent } from './events.js';
import { changed, counting, describeIssue, refuse, STOPPED, timerEvent } from './internal.js';
import { checkMinimum } from './minimum-gate.js';
import type { Timer, TimerKind } from './timer.js';

const REST_MINIMUM: Partial<Record<TimerKind, number>> = {
  'canner-rest': CANNER_REST_MS,
  'cooling-rest': COOLING_REST_MS,
};
const isProcess = (kind: TimerKind) => kind === 'process' || kind === 'pressure-process';

/** The full time and the minimum for a new timer, or why it cannot be made. */
function timing(input: ReturnType<typeof newTimerSchema.parse>) {
  if (isProcess(input.kind)) {
    if (input.testedMs === undefined) {
      return refuse('invalid_input', 'A process timer needs the tested process time for the recipe at this altitude.');
    }
    return { durationMs: input.durationMs ?? input.testedMs, minimumMs: input.testedMs };
  }
  if (input.testedMs !== undefined) return refuse('invalid_input', 'Only process timers have a tested time.');
  const rest = REST_MINIMUM[input.kind];
  if (rest !== undefined) return { durationMs: input.durationMs ?? rest, minimumMs: rest };
  if (input.durationMs === undefined) return refuse('invalid_input', 'Give the timer a duration.');
  return { durationMs: input.durationMs, minimumMs: null };
}

/**
 * Put a new timer on the day. Simple timers begin `ready` (or `running` with `startNow`); process timers begin
 * `armed` and count only from a confirmed rolling boil or from reaching pressure. A duration below the tested
 * process time (or below a rest's minimum) needs a lead's override with a reason, which the timer keeps.
 * Watchers cannot create timers.
 */
export function createTimer(input: NewTimer, ctx: CreateContext): TimerResult {
  const context = commandContextSchema.safeParse({ now: ctx.now, actorRole: ctx.actorRole, actorId: ctx.actorId });
  if (!context.success || !ctx.timerId || !ctx.dayId) return refuse('forbidden', 'The command has no valid actor.');
  if (ctx.actorRole === 'watcher') {
    return refuse('forbidden', 'Watchers follow the board; only a lead or a helper can start timers.');
  }
  const parsed = newTimerSchema.safeParse(input);
  if (!parsed.success) return refuse('invalid_input', describeIssue(parsed.error));
  const spec = parsed.data;
  if (spec.startNow && isProcess(spec.kind)) {
    return refuse('invalid_input', 'A process timer starts only from a confirmed rolling boil or from pressure.');
  }
  const time = timing(spec);
  if ('ok' in time) return time;
  const gate = checkMinimum(spec.kind, time.durationMs, time.minimumMs, spec.override, ctx);
  if (!gate.ok) return gate;

  const timer: Timer = {
    id: ctx.timerId,
    dayId: ctx.dayId,
    loadId: spec.loadId ?? null,
    kind: spec.kind,
    label: spec.label,
    state: isProcess(spec.kind) ? 'armed' : 'ready',
    durationMs: time.durationMs,
    minimumMs: time.minimumMs,
    ...STOPPED,
    restarts: 0,
    doneAt: null,
    lateByMs: null,
    alarm: null,
    overrides: gate.override ? [gate.override] : [],
    createdAt: ctx.now,
    createdBy: ctx.actorId,
    updatedAt: ctx.now,
    version: 1,
  };
  const events: TimerEvent[] = [timerEvent('timer.created', null, timer, ctx.now, { durationMs: timer.durationMs })];
  if (gate.override) {
    const { reason, minimumMs } = gate.override;
    events.push(
      timerEvent('timer.override', timer, timer, ctx.now, { reason, durationMs: timer.durationMs, minimumMs }),
    );
  }
  if (!spec.startNow) return changed(timer, events);
  const running: Timer = { ...timer, state: 'running', ...counting(ctx.now, timer.durationMs) };
  events.push(timerEvent('timer.started', timer, running, ctx.now, { deadlineAt: running.deadlineAt ?? undefined }));
  return changed(running, events);
}
