/**
 * The live canning day over socket.io: one typed contract for the server's gateway and the web app's socket.
 *
 * Commands go client -> server and are always acknowledged with `{ data } | { error }`. Every command that changes
 * something carries a `commandId` (a uuid made on the device), so a retry or a doubled tap acts once. Timer verbs
 * share ONE event, `timer:command`, whose `command` is a discriminated union (`type`): one handler, one schema,
 * and a new verb needs no new event. Changes reach devices on ONE ordered stream, `day:event`, numbered per day
 * (`seq`), so a device that missed some asks for them with `day:join { sinceSeq }`.
 */
import { z } from 'zod';
import {
  MAX_EPOCH_MS,
  newTimerSchema,
  timerCommandSchema,
  timerEventDetailSchema,
  timerSchema,
  timerStateSchema,
  TIMER_ERROR_CODES,
} from '@jarday/live';
import type { Timer, TimerEvent, TimerEventDetail, TimerEventType, TimerState } from '@jarday/live';
import { idSchema } from './kitchens.js';

/** The core's types that appear in this contract, so a client can type its handlers from here alone. */
export type { NewTimer, Timer, TimerCommand, TimerEventDetail, TimerEventType, TimerState } from '@jarday/live';

/* ---------- answers ---------- */

export const LIVE_ERROR_CODES = [
  'validation_failed',
  'unauthorized',
  'not_found',
  'not_joined',
  'command_id_reused',
  'rate_limited',
  'internal',
  ...TIMER_ERROR_CODES,
] as const;
export type LiveErrorCode = (typeof LIVE_ERROR_CODES)[number];

/** A refusal: a stable code and a sentence a person can read (whitelisted: never an internal error's text). */
export interface LiveError {
  code: LiveErrorCode;
  message: string;
  /** One entry per bad field when validation failed. */
  issues?: { path: string; message: string }[];
}
export type Ack<T> = { data: T } | { error: LiveError };
export type AckCallback<T> = (answer: Ack<T>) => void;

/* ---------- the handshake ---------- */

/** A device names itself with a random id it keeps (local storage), so the journal can say which device acted. */
export const deviceIdSchema = z
  .string({ error: 'A device id is required' })
  .regex(/^[A-Za-z0-9_-]{8,64}$/, 'A device id is 8 to 64 letters, digits, "-" or "_"');

/** socket.io `auth` on connect: the same access token as the REST API, and the device id. */
export const liveHandshakeSchema = z.strictObject({
  token: z.string({ error: 'Sign in first' }).min(1, 'Sign in first').max(4096, 'The token is too long'),
  deviceId: deviceIdSchema,
});
export type LiveHandshake = z.infer<typeof liveHandshakeSchema>;

/* ---------- client -> server payloads ---------- */

export const commandIdSchema = z.uuid({ error: 'A command id (uuid) is required' });
export const seqSchema = z.int('A sequence number is a whole number').min(0).max(Number.MAX_SAFE_INTEGER);

/** Join a day's room. `sinceSeq`: the last `seq` this device saw, to be sent what it missed. */
export const dayJoinSchema = z.strictObject({ dayId: idSchema, sinceSeq: seqSchema.optional() });
export const dayLeaveSchema = z.strictObject({ dayId: idSchema });

/** Put a new timer on the day. The server assigns its id and, for a load's process, checks `testedMs` against the plan. */
export const timerStartSchema = z.strictObject({ commandId: commandIdSchema, dayId: idSchema, timer: newTimerSchema });

/** Any verb on an existing timer: start, pause, rolling-boil, boil-lost, at-pressure, set-duration, ... */
export const timerCommandPayloadSchema = z.strictObject({
  commandId: commandIdSchema,
  dayId: idSchema,
  timerId: idSchema,
  command: timerCommandSchema,
});

/** Silence a timer's alarm on every device. The same as `timer:command` with `{ type: 'acknowledge' }`. */
export const alarmAckSchema = z.strictObject({ commandId: commandIdSchema, dayId: idSchema, timerId: idSchema });

/**
 * The step guide's steps, in the order of a canning day. Batches go through the prep steps, loads through the rest;
 * each confirmation is a journal entry, so the day's record shows who did what and when.
 */
export const STEP_KEYS = [
  'blanch',
  'peel',
  'simmer',
  'warm-jars',
  'fill',
  'headspace',
  'free-bubbles',
  'wipe-rims',
  'lids-bands',
  'water-over-jars',
  'wait-for-boil',
  'process',
  'heat-off-lid-off',
  'rest',
  'lift-jars',
  'cooling-shelf',
] as const;
export const stepKeySchema = z.enum(STEP_KEYS, { error: `A step is one of: ${STEP_KEYS.join(', ')}` });
export type StepKey = z.infer<typeof stepKeySchema>;

/** Tick (or untick) a step of a batch or a load. */
export const stepConfirmSchema = z
  .strictObject({
    commandId: commandIdSchema,
    dayId: idSchema,
    batchId: idSchema.optional(),
    loadId: idSchema.optional(),
    step: stepKeySchema,
    done: z.boolean().default(true),
  })
  .refine((p) => (p.batchId === undefined) !== (p.loadId === undefined), {
    message: 'Name either the batch or the load',
    path: ['loadId'],
  });
export type StepConfirmPayload = z.input<typeof stepConfirmSchema>;

/** Where a step stands for one batch or load. `at` is server epoch ms. */
export interface StepMark {
  subject: 'batch' | 'load';
  subjectId: string;
  step: StepKey;
  done: boolean;
  at: number;
  by: JournalActor;
}

/** A fresh access token for a connected device, before the old one runs out: no reconnect needed. */
export const sessionRenewSchema = z.strictObject({
  token: z.string({ error: 'A token is required' }).min(1).max(4096, 'The token is too long'),
});
export type SessionRenewPayload = z.input<typeof sessionRenewSchema>;

/** RFC 5905 on-wire: `t1` is the device's clock when it sent the ping (epoch ms, fractions allowed). */
export const clockPingSchema = z.strictObject({ t1: z.number().min(0).max(MAX_EPOCH_MS) });

export type DayJoinPayload = z.input<typeof dayJoinSchema>;
export type DayLeavePayload = z.input<typeof dayLeaveSchema>;
export type TimerStartPayload = z.input<typeof timerStartSchema>;
export type TimerCommandPayload = z.input<typeof timerCommandPayloadSchema>;
export type AlarmAckPayload = z.input<typeof alarmAckSchema>;
export type ClockPingPayload = z.input<typeof clockPingSchema>;

/** Each client event's payload schema, so the gateway validates every message the same way. */
export const CLIENT_EVENT_SCHEMAS = {
  'day:join': dayJoinSchema,
  'day:leave': dayLeaveSchema,
  'timer:start': timerStartSchema,
  'timer:command': timerCommandPayloadSchema,
  'alarm:ack': alarmAckSchema,
  'clock:ping': clockPingSchema,
  'session:renew': sessionRenewSchema,
  'step:confirm': stepConfirmSchema,
} as const;
export type ClientEventName = keyof typeof CLIENT_EVENT_SCHEMAS;

/* ---------- server -> client ---------- */

export interface JournalActor {
  userId: string;
  name: string;
}

/**
 * One entry of a day's journal, numbered per day from 1 without gaps. `at` is server time (ISO 8601). `actor` and
 * `deviceId` are null for what the server does by itself, such as a timer coming due.
 */
export interface JournalEvent<TType extends string = string, TPayload = unknown> {
  seq: number;
  dayId: string;
  at: string;
  actor: JournalActor | null;
  deviceId: string | null;
  type: TType;
  payload: TPayload;
}

/** The payload of every `timer.*` and `alarm.*` entry: the core's event plus the timer as it stood afterwards. */
export interface TimerJournalPayload {
  timerId: string;
  from: TimerState | null;
  to: TimerState;
  detail: TimerEventDetail;
  timer: Timer;
}
export type TimerJournalEvent = JournalEvent<TimerEventType, TimerJournalPayload>;

/** The journal payload for one of the core's events; `timer` is the timer after the whole command. */
export function timerJournalPayload(event: TimerEvent, timer: Timer): TimerJournalPayload {
  return { timerId: event.timerId, from: event.from, to: event.to, detail: event.detail, timer };
}

/** Everything a device needs to draw the day, as of `seq`. `serverTime` is epoch ms when the snapshot was taken. */
export interface DaySnapshot {
  dayId: string;
  seq: number;
  serverTime: number;
  timers: Timer[];
  /** The step guide's ticks, one per batch or load and step. */
  steps: StepMark[];
}

/** The answer to `day:join`: the snapshot, and the entries after `sinceSeq` (all of them unless `missedComplete` is false). */
export interface DayJoined {
  snapshot: DaySnapshot;
  missed: JournalEvent[];
  missedComplete: boolean;
}

/** The answer to a timer command; `noop` when the timer already showed the command's intent. */
export interface TimerAnswer {
  timer: Timer;
  noop: boolean;
}

/** The answer to `clock:ping`: `t1` echoed, `t2` when the server received it, `t3` when it answered (epoch ms). */
export interface ClockPong {
  t1: number;
  t2: number;
  t3: number;
}

export const journalActorSchema = z.strictObject({
  userId: z.string().min(1).max(200),
  name: z.string().min(1).max(200),
});

/** For devices to check what arrives; the payload is checked by type (see `timerJournalPayloadSchema`). */
export const journalEventSchema = z.strictObject({
  seq: seqSchema.min(1),
  dayId: idSchema,
  at: z.iso.datetime({ offset: true }),
  actor: journalActorSchema.nullable(),
  deviceId: deviceIdSchema.nullable(),
  type: z
    .string()
    .regex(/^[a-z]+(\.[a-z-]+)+$/, 'A journal type looks like "timer.started"')
    .max(64),
  payload: z.unknown(),
});

export const timerJournalPayloadSchema = z.strictObject({
  timerId: z.string().min(1).max(200),
  from: timerStateSchema.nullable(),
  to: timerStateSchema,
  detail: timerEventDetailSchema,
  timer: timerSchema,
});

export const daySnapshotSchema = z.strictObject({
  dayId: idSchema,
  seq: seqSchema,
  serverTime: z.int().min(0).max(MAX_EPOCH_MS),
  timers: z.array(timerSchema).max(500),
  steps: z
    .array(
      z.strictObject({
        subject: z.enum(['batch', 'load']),
        subjectId: idSchema,
        step: stepKeySchema,
        done: z.boolean(),
        at: z.int().min(0).max(MAX_EPOCH_MS),
        by: journalActorSchema,
      }),
    )
    .max(5000),
});

/* ---------- the event maps (socket.io generics) ---------- */

export interface ClientToServerEvents {
  'day:join': (payload: DayJoinPayload, ack: AckCallback<DayJoined>) => void;
  'day:leave': (payload: DayLeavePayload, ack: AckCallback<{ dayId: string }>) => void;
  'timer:start': (payload: TimerStartPayload, ack: AckCallback<TimerAnswer>) => void;
  'timer:command': (payload: TimerCommandPayload, ack: AckCallback<TimerAnswer>) => void;
  'alarm:ack': (payload: AlarmAckPayload, ack: AckCallback<TimerAnswer>) => void;
  'clock:ping': (payload: ClockPingPayload, ack: AckCallback<ClockPong>) => void;
  'session:renew': (payload: SessionRenewPayload, ack: AckCallback<{ expiresAt: number }>) => void;
  'step:confirm': (payload: StepConfirmPayload, ack: AckCallback<{ mark: StepMark }>) => void;
}

export interface ServerToClientEvents {
  /** One journal entry, in `seq` order, to everyone in the day's room (the sender included). */
  'day:event': (event: JournalEvent) => void;
  /** A whole fresh picture, when the server cannot send a device the entries it missed (or after a restart). */
  'day:snapshot': (snapshot: DaySnapshot) => void;
  /** The device's access token ran out: renew it (`session:renew`) or sign in again. */
  'session:expired': (info: { message: string }) => void;
}
