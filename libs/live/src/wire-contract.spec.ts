// The socket contract in @jarday/contracts (live.ts) wraps this package's schemas; these tests check the wrapping
// against what hostile clients may send. They belong with that file and can move there unchanged.
import {
  alarmAckSchema,
  clockPingSchema,
  CLIENT_EVENT_SCHEMAS,
  dayJoinSchema,
  daySnapshotSchema,
  journalEventSchema,
  liveHandshakeSchema,
  timerCommandPayloadSchema,
  timerJournalPayload,
  timerJournalPayloadSchema,
  timerStartSchema,
} from '@jarday/contracts';
import { describe, expect, it } from 'vitest';
import { fireDue } from './schedule.js';
import { boilingWater, cmd, DAY_ID, expectOk, MIN, run, T0, TIMER_ID } from './testing/fixtures.js';

const COMMAND_ID = '1d2e3f40-5a6b-4c7d-8e9f-a0b1c2d3e4f5';
const accepts = (schema: { safeParse: (v: unknown) => { success: boolean } }, value: unknown) =>
  schema.safeParse(value).success;

describe('client payloads', () => {
  it('accept well-formed commands', () => {
    expect(dayJoinSchema.parse({ dayId: DAY_ID, sinceSeq: 41 })).toEqual({ dayId: DAY_ID, sinceSeq: 41 });
    const command = { commandId: COMMAND_ID, dayId: DAY_ID, timerId: TIMER_ID, command: { type: 'rolling-boil' } };
    expect(timerCommandPayloadSchema.parse(command)).toEqual(command);
    const start = {
      commandId: COMMAND_ID,
      dayId: DAY_ID,
      timer: { kind: 'blanch', label: 'Peel', durationMs: 45_000 },
    };
    expect(timerStartSchema.parse(start)).toEqual(start);
    expect(alarmAckSchema.parse({ commandId: COMMAND_ID, dayId: DAY_ID, timerId: TIMER_ID })).toBeTruthy();
    expect(clockPingSchema.parse({ t1: 1_757_145_600_000.25 })).toEqual({ t1: 1_757_145_600_000.25 });
  });

  it('refuse garbage: missing or non-uuid ids, extra fields, bad numbers, oversized strings', () => {
    const command = { commandId: COMMAND_ID, dayId: DAY_ID, timerId: TIMER_ID, command: { type: 'rolling-boil' } };
    for (const value of [
      { ...command, commandId: undefined },
      { ...command, commandId: 'again' },
      { ...command, dayId: "1' OR '1'='1" },
      { ...command, command: { type: 'rolling-boil', at: 0 } },
      { ...command, actorRole: 'lead' },
      { ...command, command: { type: 'add-time', addMs: 1e12 } },
    ]) {
      expect(accepts(timerCommandPayloadSchema, value), JSON.stringify(value)).toBe(false);
    }
    expect(accepts(dayJoinSchema, { dayId: DAY_ID, sinceSeq: -1 })).toBe(false);
    expect(accepts(dayJoinSchema, { dayId: DAY_ID, sinceSeq: 1.5 })).toBe(false);
    expect(accepts(clockPingSchema, { t1: Number.POSITIVE_INFINITY })).toBe(false);
    expect(accepts(clockPingSchema, { t1: -1 })).toBe(false);
    expect(accepts(clockPingSchema, { t1: 1, t2: 2 })).toBe(false);
    const start = {
      commandId: COMMAND_ID,
      dayId: DAY_ID,
      timer: { kind: 'simmer', label: 'x'.repeat(81), durationMs: 1 },
    };
    expect(accepts(timerStartSchema, start)).toBe(false);
  });

  it('has a schema for every client event', () => {
    expect(Object.keys(CLIENT_EVENT_SCHEMAS).sort()).toEqual([
      'alarm:ack',
      'clock:ping',
      'day:join',
      'day:leave',
      'session:renew',
      'step:confirm',
      'timer:command',
      'timer:start',
    ]);
  });

  it('handshake: a token and a plain device id', () => {
    expect(accepts(liveHandshakeSchema, { token: 'abc', deviceId: 'tablet_7f3a9c' })).toBe(true);
    expect(accepts(liveHandshakeSchema, { token: 'abc', deviceId: 'short' })).toBe(false);
    expect(accepts(liveHandshakeSchema, { token: 'abc', deviceId: '<script>alert(1)</script>' })).toBe(false);
    expect(accepts(liveHandshakeSchema, { token: 'x'.repeat(5000), deviceId: 'tablet_7f3a9c' })).toBe(false);
  });
});

describe('server messages', () => {
  it('a timer journal entry carries the core event and the timer after it', () => {
    const running = run(run(boilingWater(), cmd.heating, T0), cmd.boil, T0);
    const fired = expectOk(fireDue(running, T0 + 45 * MIN));
    const [done] = fired.events;
    const entry = {
      seq: 12,
      dayId: DAY_ID,
      at: new Date(done!.at).toISOString(),
      actor: null,
      deviceId: null,
      type: done!.type,
      payload: timerJournalPayload(done!, fired.timer),
    };
    expect(journalEventSchema.parse(entry)).toEqual(entry);
    expect(timerJournalPayloadSchema.parse(entry.payload)).toEqual(entry.payload);
    expect(accepts(journalEventSchema, { ...entry, seq: 0 })).toBe(false);
    expect(accepts(journalEventSchema, { ...entry, at: 'yesterday' })).toBe(false);
    expect(accepts(journalEventSchema, { ...entry, type: 'DROP TABLE' })).toBe(false);
    const snapshot = { dayId: DAY_ID, seq: 12, serverTime: T0 + 45 * MIN, timers: [fired.timer], steps: [] };
    expect(daySnapshotSchema.parse(snapshot)).toEqual(snapshot);
  });
});
