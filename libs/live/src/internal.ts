// Small builders shared by the transition modules; not part of the package's public API.
import type { TimerCommandType, TimerErrorCode, TimerResult } from './commands.js';
import type { TimerEvent, TimerEventDetail, TimerEventType } from './events.js';
import type { Timer, TimerKind } from './timer.js';

export type Refusal = Extract<TimerResult, { ok: false }>;
export type Success = Extract<TimerResult, { ok: true }>;

export function refuse(code: TimerErrorCode, message: string): Refusal {
  return { ok: false, error: { code, message } };
}

/** The intent is already the timer's state: success, nothing changes. */
export function unchanged(timer: Timer): Success {
  return { ok: true, timer, events: [], noop: true };
}

export function changed(timer: Timer, events: TimerEvent[]): Success {
  return { ok: true, timer, events, noop: false };
}

export function timerEvent(
  type: TimerEventType,
  before: Timer | null,
  after: Timer,
  at: number,
  detail: TimerEventDetail = {},
): TimerEvent {
  // Drop unset fields so the event is the same before and after a JSON round trip.
  const facts = Object.fromEntries(Object.entries(detail).filter(([, v]) => v !== undefined)) as TimerEventDetail;
  return { type, timerId: after.id, at, from: before ? before.state : null, to: after.state, detail: facts };
}

/** Clock fields cleared: nothing counts. */
export const STOPPED = { phaseStartedAt: null, deadlineAt: null, pausedRemainingMs: null } as const;

/** Clock fields for a phase that starts counting now and lasts `ms`. */
export function counting(now: number, ms: number) {
  return { phaseStartedAt: now, deadlineAt: now + ms, pausedRemainingMs: null };
}

/** How a command reads in a refusal: the words on the button. */
export const COMMAND_NAMES: Record<TimerCommandType, string> = {
  start: '"Start"',
  pause: '"Pause"',
  resume: '"Resume"',
  'add-time': '"Add time"',
  cancel: '"Cancel"',
  'water-heating': '"Water heating, lid on"',
  'rolling-boil': '"Rolling boil"',
  'boil-lost': '"Boil lost"',
  'start-venting': '"Venting"',
  'at-pressure': '"At pressure"',
  'pressure-lost': '"Pressure lost"',
  'heat-off': '"Heat off"',
  'gauge-zero': '"Gauge at zero"',
  'set-duration': '"Set process time"',
  acknowledge: '"Acknowledge"',
};

export const KIND_NAMES: Record<TimerKind, string> = {
  blanch: 'a blanch timer',
  simmer: 'a simmer timer',
  'hot-hold': 'a hot-hold timer',
  process: 'a boiling-water process timer',
  'pressure-process': 'a pressure process timer',
  'canner-rest': 'a canner rest timer',
  'cooling-rest': 'a cooling rest timer',
  custom: 'a custom timer',
};

export function wrongKind(command: TimerCommandType, kind: TimerKind, hint = ''): Refusal {
  return refuse('wrong_kind', `${COMMAND_NAMES[command]} does not apply to ${KIND_NAMES[kind]}.${hint}`);
}

export const CANCELLED_MESSAGE = 'The timer was cancelled.';

/** Stamp a successful change: one version step and `updatedAt` per answered command or firing, however many events. */
export function commit(original: Timer, result: TimerResult, now: number): TimerResult {
  if (!result.ok || result.events.length === 0) return result;
  return { ...result, timer: { ...result.timer, version: original.version + 1, updatedAt: now } };
}

/** The first schema issue as one sentence, naming the field, for an `invalid_input` refusal. */
export function describeIssue(error: { issues: readonly { path: PropertyKey[]; message: string }[] }): string {
  const issue = error.issues[0];
  if (!issue) return 'The input is not valid.';
  return issue.path.length > 0 ? `${issue.path.map(String).join('.')}: ${issue.message}` : issue.message;
}
