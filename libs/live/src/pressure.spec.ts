import { describe, expect, it } from 'vitest';
import { applyTimerCommand } from './apply.js';
import type { TimerCommand } from './commands.js';
import { PRESSURE_OPENING_WAIT_1994_MS, PRESSURE_OPENING_WAIT_MS, PRESSURE_VENT_MS } from './constants.js';
import { fireDue, nextDeadline, remainingMs } from './schedule.js';
import { cmd, ctx, expectOk, expectRefused, MIN, pressure, run, T0 } from './testing/fixtures.js';
import type { Timer } from './timer.js';

const PROCESS = 25 * MIN;
const fire = (t: Timer, at: number) => expectOk(fireDue(t, at)).timer;
const venting = () => run(pressure(PROCESS), cmd.vent, T0);
const comingUp = () => fire(venting(), T0 + 10 * MIN);
const atPressure = () => run(comingUp(), cmd.atPressure, T0 + 18 * MIN);
const done = () => fire(atPressure(), T0 + 43 * MIN);
const cooling = () => run(done(), cmd.heatOff, T0 + 44 * MIN);

describe('the published waits', () => {
  it('vent 10 min (USDA Guide 1, confirmed); wait 10 min after zero (USDA 2015; the 1994 text said 2 min)', () => {
    expect(PRESSURE_VENT_MS).toBe(10 * MIN);
    expect(PRESSURE_OPENING_WAIT_MS).toBe(10 * MIN);
    expect(PRESSURE_OPENING_WAIT_1994_MS).toBe(2 * MIN);
  });
});

describe('pressure process: the whole sequence', () => {
  it('vents 10 min, waits for pressure, counts the full time, cools untimed, waits 10 min, finishes', () => {
    const armed = pressure(PROCESS);
    expect(armed).toMatchObject({ state: 'armed', deadlineAt: null });

    const vent = venting();
    expect(vent).toMatchObject({ state: 'venting', phaseStartedAt: T0, deadlineAt: T0 + 10 * MIN });
    expect(remainingMs(vent, T0 + 4 * MIN)).toBe(6 * MIN);

    const vented = expectOk(fireDue(vent, T0 + 10 * MIN));
    expect(vented.timer).toMatchObject({ state: 'coming-up', deadlineAt: null, alarm: { reason: 'vented' } });
    expect(vented.events.map((e) => e.type)).toEqual(['timer.vented', 'alarm.raised']);
    // Coming up to pressure is untimed: it waits for a person to read the gauge or see the weight rock.
    expect(nextDeadline(vented.timer)).toBeNull();
    expect(remainingMs(vented.timer, T0 + 60 * MIN)).toBe(PROCESS);

    const processing = atPressure();
    expect(processing).toMatchObject({ state: 'running', phaseStartedAt: T0 + 18 * MIN, deadlineAt: T0 + 43 * MIN });

    const timeUp = done();
    expect(timeUp).toMatchObject({ state: 'done', doneAt: T0 + 43 * MIN, alarm: { reason: 'done' } });

    const cool = cooling();
    expect(cool).toMatchObject({ state: 'cooling-down', deadlineAt: null });
    expect(nextDeadline(cool)).toBeNull();
    expect(expectRefused(fireDue(cool, T0 + 10 * 60 * MIN)).code).toBe('not_due');

    const wait = run(cool, cmd.gaugeZero, T0 + 80 * MIN);
    expect(wait.state).toBe('opening-wait');
    expect(wait.deadlineAt! - (T0 + 80 * MIN)).toBe(10 * MIN);
    expect(wait.deadlineAt! - (T0 + 80 * MIN)).not.toBe(PRESSURE_OPENING_WAIT_1994_MS);

    const open = expectOk(fireDue(wait, T0 + 90 * MIN));
    expect(open.timer).toMatchObject({ state: 'finished', alarm: { reason: 'may-open' }, doneAt: T0 + 43 * MIN });
    expect(open.events.map((e) => e.type)).toEqual(['timer.finished', 'alarm.raised']);
  });

  it('does not let the canner come up to pressure before the full 10-minute vent', () => {
    expect(expectRefused(applyTimerCommand(pressure(), cmd.atPressure, ctx(T0)))).toEqual({
      code: 'invalid_state',
      message: 'Vent the canner for 10 min first, then close the vent.',
    });
    const early = applyTimerCommand(venting(), cmd.atPressure, ctx(T0 + 10 * MIN - 1));
    expect(expectRefused(early).message).toBe('Let the canner vent the full 10 min before bringing it up to pressure.');
    // At 10:00 the vent is over even if the server's timeout has not fired yet: the command settles it first.
    const onTime = expectOk(applyTimerCommand(venting(), cmd.atPressure, ctx(T0 + 10 * MIN)));
    expect(onTime.events.map((e) => e.type)).toEqual(['timer.vented', 'alarm.raised', 'timer.at-pressure']);
    expect(onTime.timer).toMatchObject({ state: 'running', deadlineAt: T0 + 10 * MIN + PROCESS });
  });

  it('refuses heat-off before the time is done, and zero before the heat is off', () => {
    expect(expectRefused(applyTimerCommand(atPressure(), cmd.heatOff, ctx(T0 + 20 * MIN))).message).toBe(
      'The load has not had its full time at pressure yet: turn the heat off only once the time is done.',
    );
    expect(expectRefused(applyTimerCommand(done(), cmd.gaugeZero, ctx(T0 + 44 * MIN))).message).toBe(
      'Turn the heat off first and let the pressure fall to zero by itself.',
    );
    expect(expectRefused(applyTimerCommand(comingUp(), cmd.gaugeZero, ctx(T0 + 11 * MIN))).message).toBe(
      'The gauge reading zero only counts after the load has processed and cooled.',
    );
    expect(expectRefused(applyTimerCommand(atPressure(), cmd.vent, ctx(T0 + 20 * MIN))).message).toBe(
      'Venting comes first, before the canner comes up to pressure.',
    );
  });

  it('answers repeated presses with the state already reached', () => {
    const pairs: [Timer, TimerCommand][] = [
      [venting(), cmd.vent],
      [atPressure(), cmd.atPressure],
      [cooling(), cmd.heatOff],
      [run(cooling(), cmd.gaugeZero, T0 + 80 * MIN), cmd.gaugeZero],
    ];
    for (const [t, command] of pairs) {
      const again = expectOk(applyTimerCommand(t, command, ctx((t.phaseStartedAt ?? t.updatedAt) + 1)));
      expect(again).toEqual({ ok: true, timer: t, events: [], noop: true });
    }
  });

  it('once finished, only the alarm can be acknowledged', () => {
    const finished = fire(run(cooling(), cmd.gaugeZero, T0 + 80 * MIN), T0 + 90 * MIN);
    expect(expectRefused(applyTimerCommand(finished, cmd.cancel, ctx(T0 + 91 * MIN))).code).toBe('invalid_state');
    expect(expectRefused(applyTimerCommand(finished, cmd.gaugeZero, ctx(T0 + 91 * MIN))).message).toBe(
      'This load is finished: the canner may be opened.',
    );
    expect(run(finished, cmd.ack, T0 + 91 * MIN).alarm).toMatchObject({ acknowledgedAt: T0 + 91 * MIN });
  });

  it('can be cancelled while it cools', () => {
    expect(run(cooling(), cmd.cancel, T0 + 50 * MIN).state).toBe('cancelled');
  });
});

// If pressure falls below the target, bring it back and time the full process again (USDA Guide 1; from memory).
describe('pressure lost: the full time again', () => {
  it('goes back to coming-up with the whole process time', () => {
    const lost = expectOk(applyTimerCommand(atPressure(), cmd.pressureLost, ctx(T0 + 38 * MIN)));
    expect(lost.timer).toMatchObject({ state: 'coming-up', deadlineAt: null, restarts: 1 });
    expect(lost.events[0]).toMatchObject({ type: 'timer.pressure-lost', detail: { lostAfterMs: 20 * MIN } });
    expect(remainingMs(lost.timer, T0 + 39 * MIN)).toBe(PROCESS);
    // Back at pressure at 0:42: 0:42 + 25 min = 1:07, not 0:42 + the 5 min that were left.
    expect(run(lost.timer, cmd.atPressure, T0 + 42 * MIN).deadlineAt).toBe(T0 + 67 * MIN);
  });

  it('a second press for the same loss changes nothing; with no pressure to lose it is refused', () => {
    const lost = run(atPressure(), cmd.pressureLost, T0 + 30 * MIN);
    expect(expectOk(applyTimerCommand(lost, cmd.pressureLost, ctx(T0 + 30 * MIN)))).toMatchObject({ noop: true });
    for (const t of [pressure(), venting(), comingUp(), done(), cooling()]) {
      expect(expectRefused(applyTimerCommand(t, cmd.pressureLost, ctx(T0 + 50 * MIN)))).toEqual({
        code: 'invalid_state',
        message: 'Pressure can only be lost while the load is processing at pressure.',
      });
    }
  });
});

describe('a pressure process is never paused or force-cooled', () => {
  it('has no pause, resume, start or extra time, and no boiling-water verbs', () => {
    const verbs: TimerCommand[] = [
      cmd.pause,
      cmd.resume,
      cmd.start,
      { type: 'add-time', addMs: MIN },
      cmd.heating,
      cmd.boil,
      cmd.boilLost,
    ];
    for (const command of verbs) {
      expect(expectRefused(applyTimerCommand(atPressure(), command, ctx(T0 + 20 * MIN))).code).toBe('wrong_kind');
    }
    expect(expectRefused(applyTimerCommand(atPressure(), cmd.pause, ctx(T0 + 20 * MIN))).message).toContain(
      'A pressure process is never paused',
    );
  });
});
