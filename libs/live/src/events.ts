import { z } from 'zod';
import { ALARM_REASONS, durationMsSchema, epochMsSchema, reasonSchema, timerStateSchema } from './timer.js';
import type { AlarmReason, TimerState } from './timer.js';
import { MAX_DURATION_MS, MAX_EPOCH_MS } from './constants.js';

/** What happened to a timer, for the day's journal and the broadcasts. */
export const TIMER_EVENT_TYPES = [
  'timer.created',
  'timer.started',
  'timer.paused',
  'timer.resumed',
  'timer.time-added',
  'timer.duration-set',
  'timer.override',
  'timer.cancelled',
  /** Boiling water: the water is heating with the lid on. */
  'timer.heating',
  /** Boiling water: a person confirmed a full rolling boil; the full process time starts. */
  'timer.boil-confirmed',
  /** Boiling water: the boil stopped; the full time will start again at the next rolling boil. */
  'timer.boil-lost',
  'timer.venting',
  /** Pressure: the 10-minute vent is over; the canner comes up to pressure next. */
  'timer.vented',
  'timer.at-pressure',
  'timer.pressure-lost',
  /** The main phase's time was reached (a process: the load has had its full time). */
  'timer.done',
  'timer.heat-off',
  'timer.gauge-zero',
  /** Pressure: the wait after zero is over; the lid may come off. */
  'timer.finished',
  'alarm.raised',
  'alarm.acknowledged',
] as const;
export type TimerEventType = (typeof TIMER_EVENT_TYPES)[number];

/** The facts particular to an event; each type fills only the fields that mean something for it. */
export interface TimerEventDetail {
  /** created, duration-set, time-added: the (new) full time. */
  durationMs?: number;
  previousDurationMs?: number;
  addedMs?: number;
  /** When the clock that just started will end. */
  deadlineAt?: number;
  /** paused: the time left on the clock. */
  remainingMs?: number;
  /** boil-lost, pressure-lost: how long the lost run had counted, and the loss count so far. */
  lostAfterMs?: number;
  restarts?: number;
  /** done, vented, finished: the deadline reached, and how late the server noticed it. */
  dueAt?: number;
  lateByMs?: number;
  alarmReason?: AlarmReason;
  /** override: the lead's reason and the minimum it went below. */
  reason?: string;
  minimumMs?: number;
}

export interface TimerEvent {
  type: TimerEventType;
  timerId: string;
  /** Server time of the event, epoch ms. */
  at: number;
  /** The state before (null for `timer.created`) and after. */
  from: TimerState | null;
  to: TimerState;
  detail: TimerEventDetail;
}

const msSchema = z.int().min(0).max(MAX_DURATION_MS);

export const timerEventDetailSchema = z.strictObject({
  durationMs: durationMsSchema.optional(),
  previousDurationMs: durationMsSchema.optional(),
  addedMs: durationMsSchema.optional(),
  deadlineAt: epochMsSchema.optional(),
  remainingMs: msSchema.optional(),
  lostAfterMs: msSchema.optional(),
  restarts: z.int().min(0).max(10_000).optional(),
  dueAt: epochMsSchema.optional(),
  lateByMs: z.int().min(0).max(MAX_EPOCH_MS).optional(),
  alarmReason: z.enum(ALARM_REASONS).optional(),
  reason: reasonSchema.optional(),
  minimumMs: durationMsSchema.optional(),
});

export const timerEventSchema: z.ZodType<TimerEvent> = z.strictObject({
  type: z.enum(TIMER_EVENT_TYPES),
  timerId: z.string().min(1).max(200),
  at: epochMsSchema,
  from: timerStateSchema.nullable(),
  to: timerStateSchema,
  detail: timerEventDetailSchema,
});
