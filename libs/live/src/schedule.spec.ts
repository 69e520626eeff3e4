import { describe, expect, it } from 'vitest';
import { applyTimerCommand } from './apply.js';
import { HOUR_MS } from './constants.js';
import { dueTimers, fireDue, nextDeadline, remainingMs, settle } from './schedule.js';
import { boilingWater, cmd, ctx, expectOk, expectRefused, make, MIN, pressure, run, T0 } from './testing/fixtures.js';
import { parseTimer, type Timer } from './timer.js';

const simmer = (minutes: number, id: string): Timer => ({
  ...make({ kind: 'simmer', label: `Simmer ${minutes}`, durationMs: minutes * MIN }),
  id,
});
const boiling = (at: number) => run(run(boilingWater(45 * MIN), cmd.heating, T0), cmd.boil, at);

describe('nextDeadline', () => {
  it('is the one moment to look again, and null while nothing counts', () => {
    const armed = boilingWater();
    expect(nextDeadline(armed)).toBeNull();
    expect(nextDeadline(run(armed, cmd.heating, T0))).toBeNull();
    expect(nextDeadline(boiling(T0 + 20 * MIN))).toBe(T0 + 65 * MIN);
    const paused = run(run(simmer(10, 'a'), cmd.start, T0), cmd.pause, T0 + MIN);
    expect(nextDeadline(paused)).toBeNull();
    expect(nextDeadline(run(pressure(), cmd.vent, T0))).toBe(T0 + 10 * MIN);
  });
});

describe('fireDue', () => {
  it('refuses before the deadline and when nothing counts', () => {
    expect(expectRefused(fireDue(boiling(T0), T0 + 40 * MIN))).toEqual({
      code: 'not_due',
      message: 'The timer is not due yet: 5 min to go.',
    });
    expect(expectRefused(fireDue(boilingWater(), T0))).toEqual({
      code: 'not_due',
      message: 'Nothing is counting on this timer.',
    });
  });

  it('fires at the deadline exactly, not late, and only once', () => {
    const fired = expectOk(fireDue(boiling(T0), T0 + 45 * MIN));
    expect(fired.timer).toMatchObject({ state: 'done', lateByMs: 0, doneAt: T0 + 45 * MIN });
    expect(fired.events[0]).toMatchObject({ type: 'timer.done', detail: { dueAt: T0 + 45 * MIN, lateByMs: 0 } });
    expect(expectRefused(fireDue(fired.timer, T0 + 46 * MIN)).code).toBe('not_due');
  });

  it('marks a timer that came due while the server was down late by the real amount', () => {
    // Stored at 08:20 with the load at a rolling boil; the server went down and came back at 11:02:03.
    const stored = JSON.stringify(boiling(T0 + 20 * MIN));
    const backAt = T0 + 3 * HOUR_MS + 2 * MIN + 3_000;
    const restored = parseTimer(JSON.parse(stored));
    expect(dueTimers([restored], backAt)).toEqual([restored]);
    const fired = expectOk(fireDue(restored, backAt));
    // Due at 08:20 + 45 min = 09:05; noticed at 11:02:03: 1 h 57 min 3 s late.
    expect(fired.timer.lateByMs).toBe(HOUR_MS + 57 * MIN + 3_000);
    expect(fired.timer.doneAt).toBe(T0 + 65 * MIN);
    expect(fired.timer.alarm).toEqual({ reason: 'done', raisedAt: backAt });
  });

  it('steps the version once per firing', () => {
    const running = boiling(T0);
    expect(expectOk(fireDue(running, T0 + 45 * MIN)).timer.version).toBe(running.version + 1);
  });
});

describe('dueTimers and settle', () => {
  it('lists only what is due, earliest first', () => {
    const a = run(simmer(30, 'a'), cmd.start, T0);
    const b = run(simmer(10, 'b'), cmd.start, T0);
    const c = run(simmer(60, 'c'), cmd.start, T0);
    const ready = simmer(5, 'd');
    expect(dueTimers([a, b, c, ready], T0 + 45 * MIN).map((t) => t.id)).toEqual(['b', 'a']);
    expect(dueTimers([a, b, c, ready], T0 + 5 * MIN)).toEqual([]);
  });

  it('settles a pressure vent that ended while nobody looked, and leaves an untimed phase alone', () => {
    const venting = run(pressure(), cmd.vent, T0);
    const settled = settle(venting, T0 + 25 * MIN);
    expect(settled.timer).toMatchObject({ state: 'coming-up', lateByMs: 15 * MIN, version: venting.version + 1 });
    expect(settled.events.map((e) => e.type)).toEqual(['timer.vented', 'alarm.raised']);
    expect(settle(settled.timer, T0 + 99 * HOUR_MS)).toEqual({ timer: settled.timer, events: [] });
  });

  it('a command settles first: acknowledging after the deadline sees the alarm it raised', () => {
    const result = expectOk(applyTimerCommand(boiling(T0), cmd.ack, ctx(T0 + 50 * MIN)));
    expect(result.events.map((e) => e.type)).toEqual(['timer.done', 'alarm.raised', 'alarm.acknowledged']);
    expect(result.timer).toMatchObject({ state: 'done', lateByMs: 5 * MIN });
  });
});

describe('remainingMs', () => {
  it('counts down, never below zero, and shows the full time while waiting to start', () => {
    const running = boiling(T0);
    expect(remainingMs(running, T0 + 15 * MIN)).toBe(30 * MIN);
    expect(remainingMs(running, T0 + 45 * MIN)).toBe(0);
    expect(remainingMs(running, T0 + 50 * MIN)).toBe(0);
    expect(remainingMs(boilingWater(), T0)).toBe(45 * MIN);
    expect(remainingMs(expectOk(fireDue(running, T0 + 45 * MIN)).timer, T0 + 46 * MIN)).toBe(0);
  });
});
