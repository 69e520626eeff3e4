import { describe, expect, it } from 'vitest';
import { applyTimerCommand } from './apply.js';
import type { TimerCommand } from './commands.js';
import { fireDue, nextDeadline, remainingMs } from './schedule.js';
import { boilingWater, cmd, ctx, expectOk, expectRefused, LOAD_ID, MIN, run, T0 } from './testing/fixtures.js';

// Quart jars of tomatoes packed in water, 0-1,000 ft: 45 min (USDA Guide 3, confirmed).
const TESTED = 45 * MIN;
const heating = () => run(boilingWater(TESTED), cmd.heating, T0);
const boiling = (at = T0 + 20 * MIN) => run(heating(), cmd.boil, at);

describe('boiling-water process: armed -> waiting-for-boil -> running -> done', () => {
  it('waits for a person to confirm the rolling boil, then counts the full tested time', () => {
    const armed = boilingWater(TESTED);
    expect(armed).toMatchObject({ kind: 'process', state: 'armed', durationMs: TESTED, minimumMs: TESTED });
    expect(armed.loadId).toBe(LOAD_ID);
    const waiting = heating();
    expect(waiting).toMatchObject({ state: 'waiting-for-boil', deadlineAt: null });
    // Heating takes as long as it takes: nothing is due however late it gets.
    expect(nextDeadline(waiting)).toBeNull();
    expect(remainingMs(waiting, T0 + 3 * 60 * MIN)).toBe(TESTED);

    const running = run(waiting, cmd.boil, T0 + 25 * MIN);
    expect(running).toMatchObject({ state: 'running', phaseStartedAt: T0 + 25 * MIN, deadlineAt: T0 + 70 * MIN });
    const done = expectOk(fireDue(running, T0 + 70 * MIN));
    expect(done.timer).toMatchObject({ state: 'done', doneAt: T0 + 70 * MIN, alarm: { reason: 'done' } });
  });

  it('refuses the boil before the water is heating, and anything once the load is done', () => {
    expect(expectRefused(applyTimerCommand(boilingWater(), cmd.boil, ctx(T0)))).toEqual({
      code: 'invalid_state',
      message: 'Put the lid on and heat the water first, then confirm the rolling boil.',
    });
    const done = expectOk(fireDue(boiling(T0), T0 + TESTED)).timer;
    for (const command of [cmd.boil, cmd.heating]) {
      expect(expectRefused(applyTimerCommand(done, command, ctx(T0 + TESTED + MIN)))).toEqual({
        code: 'invalid_state',
        message: 'The load has finished processing.',
      });
    }
    expect(expectRefused(applyTimerCommand(boiling(), cmd.heating, ctx(T0 + 21 * MIN))).message).toBe(
      'The load is already processing at a rolling boil.',
    );
    expect(expectOk(applyTimerCommand(heating(), cmd.heating, ctx(T0 + MIN)))).toMatchObject({ noop: true });
  });
});

// If the water stops boiling, bring it back to a rolling boil and time the full process again from the beginning
// (USDA Guide 1, 2015; from memory, as the product's references record).
describe('boil lost: the full time again', () => {
  it('sends the load back to waiting with the full 45 minutes, however far it had got', () => {
    const running = boiling(T0 + 10 * MIN);
    const lost = expectOk(applyTimerCommand(running, cmd.boilLost, ctx(T0 + 40 * MIN)));
    expect(lost.timer).toMatchObject({
      state: 'waiting-for-boil',
      deadlineAt: null,
      phaseStartedAt: null,
      restarts: 1,
    });
    expect(remainingMs(lost.timer, T0 + 41 * MIN)).toBe(TESTED);
    expect(lost.events).toEqual([
      {
        type: 'timer.boil-lost',
        timerId: running.id,
        at: T0 + 40 * MIN,
        from: 'running',
        to: 'waiting-for-boil',
        detail: { lostAfterMs: 30 * MIN, restarts: 1, durationMs: TESTED },
      },
    ]);
    // Back at a rolling boil at 0:50: the deadline is 0:50 + 45 min = 1:35, not 0:50 + the 15 min that were left.
    const again = run(lost.timer, cmd.boil, T0 + 50 * MIN);
    expect(again.deadlineAt).toBe(T0 + 95 * MIN);
  });

  it('can be lost again and again; each loss counts', () => {
    let t = boiling(T0);
    for (let i = 1; i <= 3; i += 1) {
      t = run(t, cmd.boilLost, T0 + i * 10 * MIN);
      expect(t.restarts).toBe(i);
      t = run(t, cmd.boil, T0 + i * 10 * MIN + MIN);
      expect(t.deadlineAt).toBe(T0 + i * 10 * MIN + MIN + TESTED);
    }
  });

  it('is refused where there is no boil to lose', () => {
    const message = 'The boil can only be lost while the load is processing.';
    const done = expectOk(fireDue(boiling(T0), T0 + TESTED)).timer;
    const cancelled = run(heating(), cmd.cancel, T0);
    for (const t of [boilingWater(), heating(), done, cancelled]) {
      expect(expectRefused(applyTimerCommand(t, cmd.boilLost, ctx(T0 + 2 * TESTED)))).toEqual({
        code: 'invalid_state',
        message,
      });
    }
  });

  it('comes too late once the time has run out: the load is done first', () => {
    const running = boiling(T0);
    const late = applyTimerCommand(running, cmd.boilLost, ctx(T0 + TESTED + 1));
    expect(expectRefused(late).message).toBe('The boil can only be lost while the load is processing.');
  });
});

// Two helpers press "Rolling boil" together: the server answers them one after the other.
describe('the double "rolling boil" rule', () => {
  it('starts ONE clock: the second press is a success that changes nothing', () => {
    const waiting = heating();
    const first = expectOk(applyTimerCommand(waiting, cmd.boil, ctx(T0 + 20 * MIN, 'helper')));
    const second = expectOk(applyTimerCommand(first.timer, cmd.boil, ctx(T0 + 20 * MIN, 'lead')));
    expect(first.noop).toBe(false);
    expect(second).toEqual({ ok: true, timer: first.timer, events: [], noop: true });
  });

  it('a press seconds later neither restarts nor shifts the clock', () => {
    const first = boiling(T0 + 20 * MIN);
    const later = expectOk(applyTimerCommand(first, cmd.boil, ctx(T0 + 20 * MIN + 3_000)));
    expect(later.timer.deadlineAt).toBe(T0 + 65 * MIN);
    expect(later.timer.version).toBe(first.version);
  });

  it('two "boil lost" presses for the same loss reset once', () => {
    const lost = run(boiling(T0), cmd.boilLost, T0 + 5 * MIN);
    const second = expectOk(applyTimerCommand(lost, cmd.boilLost, ctx(T0 + 5 * MIN + 800)));
    expect(second).toMatchObject({ noop: true, events: [] });
    expect(second.timer.restarts).toBe(1);
  });
});

describe('a process is never paused', () => {
  it('refuses pause, resume, start and extra time with a way forward', () => {
    const running = boiling();
    const pause = expectRefused(applyTimerCommand(running, cmd.pause, ctx(T0 + 21 * MIN)));
    expect(pause).toEqual({
      code: 'wrong_kind',
      message:
        '"Pause" does not apply to a boiling-water process timer. A process is never paused: if the boil stops, ' +
        'press "Boil lost"; the full time starts again at the next rolling boil.',
    });
    const others: TimerCommand[] = [cmd.resume, cmd.start, { type: 'add-time', addMs: MIN }];
    for (const command of others) {
      expect(expectRefused(applyTimerCommand(running, command, ctx(T0 + 21 * MIN))).code).toBe('wrong_kind');
    }
  });

  it('refuses pressure-canner verbs', () => {
    const verbs: TimerCommand[] = [cmd.vent, cmd.atPressure, cmd.pressureLost, cmd.heatOff, cmd.gaugeZero];
    for (const command of verbs) {
      expect(expectRefused(applyTimerCommand(boiling(), command, ctx(T0 + 21 * MIN))).code).toBe('wrong_kind');
    }
  });
});
