import { z } from 'zod';
import type { TimerEvent } from './events.js';
import {
  durationMsSchema,
  epochMsSchema,
  liveIdSchema,
  liveRoleSchema,
  reasonSchema,
  timerKindSchema,
  timerLabelSchema,
} from './timer.js';
import type { LiveRole, Timer } from './timer.js';

/** A lead's override of a safety minimum. Who made it comes from the command's context, never from the payload. */
export const leadOverrideSchema = z.strictObject({ reason: reasonSchema });
export type LeadOverride = z.infer<typeof leadOverrideSchema>;

/** Everything a person can ask of an existing timer. Which verbs apply depends on the kind and the state. */
export const timerCommandSchema = z.discriminatedUnion('type', [
  /** Simple timers: ready -> running. */
  z.strictObject({ type: z.literal('start') }),
  /** Blanch, simmer, hot-hold and custom timers only. */
  z.strictObject({ type: z.literal('pause') }),
  z.strictObject({ type: z.literal('resume') }),
  z.strictObject({ type: z.literal('add-time'), addMs: durationMsSchema }),
  z.strictObject({ type: z.literal('cancel') }),
  /** Boiling water: the water is heating with the lid on (armed -> waiting-for-boil). */
  z.strictObject({ type: z.literal('water-heating') }),
  /** Boiling water: a person sees a full rolling boil (waiting-for-boil -> running, full time). */
  z.strictObject({ type: z.literal('rolling-boil') }),
  /** Boiling water: the boil stopped (running -> waiting-for-boil, the full time again). */
  z.strictObject({ type: z.literal('boil-lost') }),
  /** Pressure: steam flows steadily from the open vent (armed -> venting, 10 min). */
  z.strictObject({ type: z.literal('start-venting') }),
  /** Pressure: the dial reads the target or the weight rocks (coming-up -> running, full time). */
  z.strictObject({ type: z.literal('at-pressure') }),
  /** Pressure: it fell below the target (running -> coming-up, the full time again). */
  z.strictObject({ type: z.literal('pressure-lost') }),
  /** Pressure: the time is done and the heat is off (done -> cooling-down, natural). */
  z.strictObject({ type: z.literal('heat-off') }),
  /** Pressure: the gauge reads zero of its own accord (cooling-down -> opening-wait, 10 min). */
  z.strictObject({ type: z.literal('gauge-zero') }),
  /** Process timers: change the process time; below the tested time only with a lead's override. */
  z.strictObject({
    type: z.literal('set-duration'),
    durationMs: durationMsSchema,
    override: leadOverrideSchema.optional(),
  }),
  /** Silence the timer's alarm on every device. */
  z.strictObject({ type: z.literal('acknowledge') }),
]);
export type TimerCommand = z.infer<typeof timerCommandSchema>;
export type TimerCommandType = TimerCommand['type'];

/**
 * A new timer. Process timers need `testedMs` (the recipe's tested time at the kitchen's altitude, which the server
 * must take from its own plan, not from a client); their duration defaults to it. Rests default to their minimum.
 * `startNow` starts a simple timer at once; process timers always begin `armed`.
 */
export const newTimerSchema = z.strictObject({
  kind: timerKindSchema,
  label: timerLabelSchema,
  durationMs: durationMsSchema.optional(),
  testedMs: durationMsSchema.optional(),
  loadId: liveIdSchema.optional(),
  startNow: z.boolean().optional(),
  override: leadOverrideSchema.optional(),
});
export type NewTimer = z.input<typeof newTimerSchema>;

/** Who is acting and when (server time, epoch ms). The server fills it from the authenticated socket. */
export interface CommandContext {
  now: number;
  actorRole: LiveRole;
  actorId: string;
}
/** For `createTimer`: the ids come from the server too, so the core stays free of randomness. */
export interface CreateContext extends CommandContext {
  timerId: string;
  dayId: string;
}

export const TIMER_ERROR_CODES = [
  /** Watchers never command; only a lead may override. */
  'forbidden',
  /** The command does not fit the timer's present state. */
  'invalid_state',
  /** The command does not apply to this kind of timer. */
  'wrong_kind',
  /** Shorter than the tested or safe minimum without a lead's override. */
  'below_minimum',
  'override_reason_required',
  'invalid_input',
  'no_alarm',
  /** `fireDue` on a timer whose deadline has not come. */
  'not_due',
] as const;
export type TimerErrorCode = (typeof TIMER_ERROR_CODES)[number];
export interface TimerError {
  code: TimerErrorCode;
  message: string;
}

/**
 * The answer of every transition. On success `events` lists what happened, oldest first; persist and broadcast
 * whenever it is non-empty. `noop` is true when the command's intent was already the timer's state (see
 * `applyTimerCommand`); `events` may then still hold a deadline that came due just before the command.
 */
export type TimerResult =
  { ok: true; timer: Timer; events: TimerEvent[]; noop: boolean } | { ok: false; error: TimerError };

export const commandContextSchema = z.strictObject({
  now: epochMsSchema,
  actorRole: liveRoleSchema,
  actorId: z.string().min(1).max(200),
});
