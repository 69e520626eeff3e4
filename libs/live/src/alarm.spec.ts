import { describe, expect, it } from 'vitest';
import { applyTimerCommand } from './apply.js';
import { fireDue } from './schedule.js';
import { cmd, ctx, expectOk, expectRefused, HELPER, LEAD, make, MIN, pressure, run, T0 } from './testing/fixtures.js';
import type { Timer } from './timer.js';

const dueSimmer = (): Timer => {
  const running = run(make({ kind: 'simmer', label: 'Simmer', durationMs: 10 * MIN }), cmd.start, T0);
  return expectOk(fireDue(running, T0 + 10 * MIN)).timer;
};

describe('alarms', () => {
  it('stay on until a person acknowledges them, however long that takes', () => {
    const due = dueSimmer();
    expect(due.alarm).toEqual({ reason: 'done', raisedAt: T0 + 10 * MIN });
    // No firing or command other than an acknowledgement touches it.
    expect(expectRefused(fireDue(due, T0 + 5 * 60 * MIN)).code).toBe('not_due');
    expect(due.alarm?.acknowledgedAt).toBeUndefined();
  });

  it('acknowledging records who and when, for every device', () => {
    const acked = expectOk(applyTimerCommand(dueSimmer(), cmd.ack, ctx(T0 + 11 * MIN, 'helper')));
    expect(acked.timer.alarm).toEqual({
      reason: 'done',
      raisedAt: T0 + 10 * MIN,
      acknowledgedAt: T0 + 11 * MIN,
      acknowledgedBy: HELPER,
    });
    expect(acked.events).toEqual([
      {
        type: 'alarm.acknowledged',
        timerId: acked.timer.id,
        at: T0 + 11 * MIN,
        from: 'done',
        to: 'done',
        detail: { alarmReason: 'done' },
      },
    ]);
  });

  it('acknowledging twice is harmless: the same timer back, the first person kept', () => {
    const first = expectOk(applyTimerCommand(dueSimmer(), cmd.ack, ctx(T0 + 11 * MIN, 'helper')));
    const second = expectOk(applyTimerCommand(first.timer, cmd.ack, ctx(T0 + 11 * MIN + 300, 'lead')));
    expect(second).toEqual({ ok: true, timer: first.timer, events: [], noop: true });
    expect(second.timer.alarm?.acknowledgedBy).toBe(HELPER);
  });

  it('there is nothing to acknowledge before an alarm', () => {
    const ready = make({ kind: 'simmer', label: 'Simmer', durationMs: 10 * MIN });
    expect(expectRefused(applyTimerCommand(ready, cmd.ack, ctx(T0)))).toEqual({
      code: 'no_alarm',
      message: 'There is no alarm to acknowledge on this timer.',
    });
  });

  it('each pressure step that needs a person raises a new alarm', () => {
    const comingUp = expectOk(fireDue(run(pressure(), cmd.vent, T0), T0 + 10 * MIN)).timer;
    expect(comingUp.alarm).toEqual({ reason: 'vented', raisedAt: T0 + 10 * MIN });
    const acked = run(comingUp, cmd.ack, T0 + 11 * MIN, 'lead');
    const done = expectOk(fireDue(run(acked, cmd.atPressure, T0 + 15 * MIN), T0 + 40 * MIN)).timer;
    expect(done.alarm).toEqual({ reason: 'done', raisedAt: T0 + 40 * MIN });
    expect(acked.alarm?.acknowledgedBy).toBe(LEAD);
  });

  it('cancelling a timer silences its alarm in the same person’s name', () => {
    const comingUp = expectOk(fireDue(run(pressure(), cmd.vent, T0), T0 + 10 * MIN)).timer;
    const cancelled = expectOk(applyTimerCommand(comingUp, cmd.cancel, ctx(T0 + 12 * MIN, 'lead')));
    expect(cancelled.timer.alarm).toMatchObject({ acknowledgedAt: T0 + 12 * MIN, acknowledgedBy: LEAD });
    expect(cancelled.events.map((e) => e.type)).toEqual(['timer.cancelled', 'alarm.acknowledged']);
  });
});
