import { z } from 'zod';
import { MAX_DURATION_MS, MAX_EPOCH_MS, MAX_LABEL_LENGTH, MAX_REASON_LENGTH, MIN_DURATION_MS } from './constants.js';

export const TIMER_KINDS = [
  'blanch',
  'simmer',
  'hot-hold',
  'process',
  'pressure-process',
  'canner-rest',
  'cooling-rest',
  'custom',
] as const;
export type TimerKind = (typeof TIMER_KINDS)[number];

/** Kinds a helper may pause, resume and give extra time. Rests are fixed waits; processes are never paused. */
export const ADJUSTABLE_KINDS = ['blanch', 'simmer', 'hot-hold', 'custom'] as const satisfies readonly TimerKind[];

export const SIMPLE_STATES = ['ready', 'running', 'paused', 'done', 'cancelled'] as const;
export const PROCESS_STATES = ['armed', 'waiting-for-boil', 'running', 'done', 'cancelled'] as const;
export const PRESSURE_STATES = [
  'armed',
  'venting',
  'coming-up',
  'running',
  'done',
  'cooling-down',
  'opening-wait',
  'finished',
  'cancelled',
] as const;
export const TIMER_STATES = [...new Set([...SIMPLE_STATES, ...PROCESS_STATES, ...PRESSURE_STATES])] as [
  TimerState,
  ...TimerState[],
];
export type TimerState =
  (typeof SIMPLE_STATES)[number] | (typeof PROCESS_STATES)[number] | (typeof PRESSURE_STATES)[number];

/** The states in which a clock counts towards `deadlineAt`. */
export const COUNTING_STATES = ['running', 'venting', 'opening-wait'] as const satisfies readonly TimerState[];

export const LIVE_ROLES = ['lead', 'helper', 'watcher'] as const;
export type LiveRole = (typeof LIVE_ROLES)[number];

/** What a raised alarm asks a person to do. */
export const ALARM_REASONS = [
  /** The time is up: take the food off, or (process) turn the heat off. */
  'done',
  /** The pressure canner has vented 10 minutes: close the vent or put the weight on. */
  'vented',
  /** The 10-minute wait after the gauge read zero is over: the lid may come off. */
  'may-open',
] as const;
export type AlarmReason = (typeof ALARM_REASONS)[number];

/** An alarm sounds on every device of the day until a person acknowledges it. Times are server epoch ms. */
export interface Alarm {
  reason: AlarmReason;
  raisedAt: number;
  acknowledgedAt?: number;
  /** The user id of the person who acknowledged it. */
  acknowledgedBy?: string;
}

/** A lead's decision to run a timer shorter than its safe minimum, kept on the timer for the journal. */
export interface TimerOverride {
  byUserId: string;
  reason: string;
  at: number;
  durationMs: number;
  minimumMs: number;
}

/**
 * A timer as the server stores it: plain JSON, server times in epoch ms, so it can be written to SQLite and re-armed
 * after a restart (`settle`, `nextDeadline`). Change it only through `createTimer`, `applyTimerCommand` and `fireDue`.
 */
export interface Timer {
  id: string;
  dayId: string;
  /** The canner load this timer belongs to, if any. */
  loadId: string | null;
  kind: TimerKind;
  label: string;
  state: TimerState;
  /** The full time of the main timed phase (the process time, for a process). */
  durationMs: number;
  /** The shortest duration allowed without a lead's override (tested process time, rest times); null if none. */
  minimumMs: number | null;
  /** When the phase now counting began; null when nothing counts. */
  phaseStartedAt: number | null;
  /** When the phase now counting ends; set exactly in COUNTING_STATES, null otherwise. */
  deadlineAt: number | null;
  /** Time left when a simple timer was paused; set only in `paused`. */
  pausedRemainingMs: number | null;
  /** How many times the boil or the pressure was lost; each loss restarted the full time. */
  restarts: number;
  /** The deadline at which the main phase completed (not the moment the server noticed). */
  doneAt: number | null;
  /** How late the server fired the latest deadline (it may have been down). */
  lateByMs: number | null;
  alarm: Alarm | null;
  overrides: TimerOverride[];
  createdAt: number;
  createdBy: string;
  updatedAt: number;
  /** Goes up by one with every change, for optimistic writes (`UPDATE ... WHERE version = ?`). */
  version: number;
}

export const epochMsSchema = z.int().min(0).max(MAX_EPOCH_MS);
export const durationMsSchema = z
  .int('Use whole milliseconds')
  .min(MIN_DURATION_MS, 'At least 1 second')
  .max(MAX_DURATION_MS, 'At most 48 hours');
export const liveIdSchema = z.uuid({ error: 'Must be an id' });
export const timerKindSchema = z.enum(TIMER_KINDS);
export const timerStateSchema = z.enum(TIMER_STATES);
export const liveRoleSchema = z.enum(LIVE_ROLES);
export const timerLabelSchema = z
  .string({ error: 'A label is required' })
  .trim()
  .min(1, 'A label is required')
  .max(MAX_LABEL_LENGTH, `Use at most ${MAX_LABEL_LENGTH} characters`);
export const reasonSchema = z
  .string({ error: 'A reason is required' })
  .trim()
  .min(1, 'A reason is required')
  .max(MAX_REASON_LENGTH, `Use at most ${MAX_REASON_LENGTH} characters`);

/** The states each kind may be in. */
export function statesFor(kind: TimerKind): readonly TimerState[] {
  if (kind === 'process') return PROCESS_STATES;
  if (kind === 'pressure-process') return PRESSURE_STATES;
  return SIMPLE_STATES;
}

/** True once nothing more can happen to the timer (its alarm may still want acknowledging). */
export function isTerminal(timer: Pick<Timer, 'kind' | 'state'>): boolean {
  if (timer.state === 'cancelled') return true;
  return timer.kind === 'pressure-process' ? timer.state === 'finished' : timer.state === 'done';
}

/** True for the states in which a clock counts towards `deadlineAt`. */
export function isCountingState(state: TimerState): boolean {
  return (COUNTING_STATES as readonly TimerState[]).includes(state);
}

const alarmSchema = z.strictObject({
  reason: z.enum(ALARM_REASONS),
  raisedAt: epochMsSchema,
  acknowledgedAt: epochMsSchema.optional(),
  acknowledgedBy: z.string().min(1).max(200).optional(),
});

const overrideSchema = z.strictObject({
  byUserId: z.string().min(1).max(200),
  reason: reasonSchema,
  at: epochMsSchema,
  durationMs: durationMsSchema,
  minimumMs: durationMsSchema,
});

/**
 * The stored timer, for reading rows back (and for clients to check what they receive). Besides the field types it
 * checks that the state belongs to the kind and that a deadline is set exactly while a clock counts.
 */
export const timerSchema: z.ZodType<Timer> = z
  .strictObject({
    id: z.string().min(1).max(200),
    dayId: z.string().min(1).max(200),
    loadId: z.string().min(1).max(200).nullable(),
    kind: timerKindSchema,
    label: timerLabelSchema,
    state: timerStateSchema,
    durationMs: durationMsSchema,
    minimumMs: durationMsSchema.nullable(),
    phaseStartedAt: epochMsSchema.nullable(),
    deadlineAt: epochMsSchema.nullable(),
    pausedRemainingMs: z.int().min(0).max(MAX_DURATION_MS).nullable(),
    restarts: z.int().min(0).max(10_000),
    doneAt: epochMsSchema.nullable(),
    lateByMs: z.int().min(0).max(MAX_EPOCH_MS).nullable(),
    alarm: alarmSchema.nullable(),
    overrides: z.array(overrideSchema).max(100),
    createdAt: epochMsSchema,
    createdBy: z.string().min(1).max(200),
    updatedAt: epochMsSchema,
    version: z.int().min(1),
  })
  .refine((t) => statesFor(t.kind).includes(t.state), {
    message: 'The state does not belong to this kind of timer',
    path: ['state'],
  })
  .refine((t) => (t.deadlineAt !== null) === isCountingState(t.state), {
    message: 'A deadline is set exactly while a clock counts',
    path: ['deadlineAt'],
  })
  .refine((t) => (t.pausedRemainingMs !== null) === (t.state === 'paused'), {
    message: 'The time left is kept exactly while a timer is paused',
    path: ['pausedRemainingMs'],
  });

/** Read a stored timer back (for example a SQLite JSON column), throwing a ZodError when it is not a timer. */
export function parseTimer(value: unknown): Timer {
  return timerSchema.parse(value);
}
