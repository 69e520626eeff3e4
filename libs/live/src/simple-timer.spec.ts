import { describe, expect, it } from 'vitest';
import { applyTimerCommand } from './apply.js';
import { BLANCH_DIP_MS, MAX_DURATION_MS, SECOND_MS } from './constants.js';
import { createTimer } from './create.js';
import { fireDue, remainingMs } from './schedule.js';
import { cmd, ctx, DAY_ID, expectOk, expectRefused, make, MIN, run, T0, TIMER_ID } from './testing/fixtures.js';
import type { TimerCommand } from './commands.js';
import type { Timer } from './timer.js';

const simmer = (): Timer => make({ kind: 'simmer', label: 'Salsa simmer', durationMs: 10 * MIN });

describe('simple timers: ready -> running -> done', () => {
  it('a tomato-peeling dip runs 30 s from start and comes due with an alarm (USDA Guide 3: 30-60 s)', () => {
    const blanch = make({ kind: 'blanch', label: 'Peel dip', durationMs: BLANCH_DIP_MS.min });
    expect(blanch).toMatchObject({ state: 'ready', durationMs: 30 * SECOND_MS, deadlineAt: null, version: 1 });

    const running = run(blanch, cmd.start, T0 + 5 * SECOND_MS);
    expect(running).toMatchObject({ state: 'running', phaseStartedAt: T0 + 5_000, deadlineAt: T0 + 35_000 });
    expect(running.version).toBe(2);

    const fired = expectOk(fireDue(running, T0 + 35_000));
    expect(fired.timer).toMatchObject({ state: 'done', doneAt: T0 + 35_000, lateByMs: 0, deadlineAt: null });
    expect(fired.timer.alarm).toEqual({ reason: 'done', raisedAt: T0 + 35_000 });
    expect(fired.events.map((e) => e.type)).toEqual(['timer.done', 'alarm.raised']);
  });

  it('startNow starts it on creation', () => {
    const result = expectOk(
      createTimer(
        { kind: 'hot-hold', label: 'Jars hot', durationMs: 30 * MIN, startNow: true },
        { ...ctx(T0), timerId: TIMER_ID, dayId: DAY_ID },
      ),
    );
    expect(result.timer).toMatchObject({ state: 'running', deadlineAt: T0 + 30 * MIN });
    expect(result.events.map((e) => [e.type, e.from, e.to])).toEqual([
      ['timer.created', null, 'ready'],
      ['timer.started', 'ready', 'running'],
    ]);
  });

  it('pause keeps the time left and resume counts it from the resume', () => {
    const paused = run(run(simmer(), cmd.start, T0), cmd.pause, T0 + 4 * MIN);
    expect(paused).toMatchObject({ state: 'paused', deadlineAt: null, pausedRemainingMs: 6 * MIN });
    expect(remainingMs(paused, T0 + 60 * MIN)).toBe(6 * MIN);
    const resumed = run(paused, cmd.resume, T0 + 20 * MIN);
    expect(resumed).toMatchObject({ state: 'running', deadlineAt: T0 + 26 * MIN, pausedRemainingMs: null });
  });

  it('adds time while ready, running or paused', () => {
    const add = { type: 'add-time', addMs: 5 * MIN } as const;
    expect(run(simmer(), add, T0)).toMatchObject({ durationMs: 15 * MIN, deadlineAt: null });
    const running = run(simmer(), cmd.start, T0);
    expect(run(running, add, T0 + MIN)).toMatchObject({ durationMs: 15 * MIN, deadlineAt: T0 + 15 * MIN });
    const paused = run(running, cmd.pause, T0 + 2 * MIN);
    expect(run(paused, add, T0 + 3 * MIN)).toMatchObject({ durationMs: 15 * MIN, pausedRemainingMs: 13 * MIN });
  });

  it('refuses extra time beyond 48 hours and after the end', () => {
    const long = make({ kind: 'custom', label: 'Long', durationMs: MAX_DURATION_MS - MIN });
    const over = expectRefused(applyTimerCommand(long, { type: 'add-time', addMs: 2 * MIN }, ctx(T0)));
    expect(over).toEqual({ code: 'invalid_input', message: 'A timer runs at most 48 h.' });
    const done = expectOk(fireDue(run(simmer(), cmd.start, T0), T0 + 10 * MIN)).timer;
    expect(expectRefused(applyTimerCommand(done, { type: 'add-time', addMs: MIN }, ctx(T0 + 11 * MIN)))).toEqual({
      code: 'invalid_state',
      message: 'The timer has already finished; start a new one if more time is needed.',
    });
  });

  it('answers a repeated start, pause or resume with the state it already has', () => {
    const running = run(simmer(), cmd.start, T0);
    const again = expectOk(applyTimerCommand(running, cmd.start, ctx(T0 + MIN)));
    expect(again).toEqual({ ok: true, timer: running, events: [], noop: true });
    const paused = run(running, cmd.pause, T0 + MIN);
    expect(expectOk(applyTimerCommand(paused, cmd.pause, ctx(T0 + 2 * MIN)))).toMatchObject({ noop: true });
    expect(expectOk(applyTimerCommand(running, cmd.resume, ctx(T0 + 2 * MIN)))).toMatchObject({ noop: true });
  });

  it('refuses pause, resume and start where they do not fit, saying why', () => {
    const ready = simmer();
    expect(expectRefused(applyTimerCommand(ready, cmd.pause, ctx(T0))).message).toBe(
      'The timer has not been started yet.',
    );
    expect(expectRefused(applyTimerCommand(ready, cmd.resume, ctx(T0))).message).toBe(
      'Only a paused timer can be resumed.',
    );
    const paused = run(run(ready, cmd.start, T0), cmd.pause, T0 + MIN);
    expect(expectRefused(applyTimerCommand(paused, cmd.start, ctx(T0)))).toEqual({
      code: 'invalid_state',
      message: 'The timer is paused: resume it first.',
    });
    const cancelled = run(ready, cmd.cancel, T0);
    expect(expectRefused(applyTimerCommand(cancelled, cmd.start, ctx(T0))).message).toBe('The timer was cancelled.');
  });

  it('never pauses or stretches a canner rest or a cooling rest', () => {
    for (const kind of ['canner-rest', 'cooling-rest'] as const) {
      const rest = run(make({ kind, label: 'Rest' }), cmd.start, T0);
      for (const command of [cmd.pause, cmd.resume, { type: 'add-time', addMs: MIN }] as TimerCommand[]) {
        const error = expectRefused(applyTimerCommand(rest, command, ctx(T0 + MIN)));
        expect(error.code).toBe('wrong_kind');
        expect(error.message).toContain('A rest is the least time to wait');
      }
    }
  });

  it('refuses process verbs on a simple timer', () => {
    const running = run(simmer(), cmd.start, T0);
    const verbs: TimerCommand[] = [
      cmd.heating,
      cmd.boil,
      cmd.boilLost,
      cmd.vent,
      cmd.atPressure,
      cmd.pressureLost,
      cmd.heatOff,
      cmd.gaugeZero,
      { type: 'set-duration', durationMs: 20 * MIN },
    ];
    for (const command of verbs) {
      expect(expectRefused(applyTimerCommand(running, command, ctx(T0 + MIN))).code).toBe('wrong_kind');
    }
    expect(expectRefused(applyTimerCommand(running, cmd.boil, ctx(T0))).message).toBe(
      '"Rolling boil" does not apply to a simmer timer.',
    );
  });
});

describe('cancel', () => {
  it('stops a ready, running or paused timer; twice is harmless; a finished one stays finished', () => {
    const ready = simmer();
    const running = run(ready, cmd.start, T0);
    const paused = run(running, cmd.pause, T0 + MIN);
    for (const t of [ready, running, paused]) {
      const cancelled = run(t, cmd.cancel, T0 + 2 * MIN);
      expect(cancelled).toMatchObject({ state: 'cancelled', deadlineAt: null, pausedRemainingMs: null });
      expect(expectOk(applyTimerCommand(cancelled, cmd.cancel, ctx(T0 + 3 * MIN)))).toMatchObject({ noop: true });
    }
    const done = expectOk(fireDue(running, T0 + 10 * MIN)).timer;
    expect(expectRefused(applyTimerCommand(done, cmd.cancel, ctx(T0 + 11 * MIN)))).toEqual({
      code: 'invalid_state',
      message: 'The timer has already finished.',
    });
  });
});

describe('roles', () => {
  it('a watcher can neither create nor command, not even acknowledge', () => {
    const made = createTimer(
      { kind: 'simmer', label: 'x', durationMs: MIN },
      { ...ctx(T0, 'watcher'), timerId: TIMER_ID, dayId: DAY_ID },
    );
    expect(expectRefused(made).code).toBe('forbidden');
    const running = run(simmer(), cmd.start, T0);
    const done = expectOk(fireDue(running, T0 + 10 * MIN)).timer;
    for (const [t, command] of [
      [running, cmd.pause],
      [running, cmd.cancel],
      [done, cmd.ack],
    ] as const) {
      expect(expectRefused(applyTimerCommand(t, command, ctx(T0 + 11 * MIN, 'watcher')))).toEqual({
        code: 'forbidden',
        message: 'Watchers follow the board; only a lead or a helper can run the timers.',
      });
    }
  });

  it('refuses a malformed command that got past the edge, naming the field', () => {
    const hostile = { type: 'add-time', addMs: -60_000 } as unknown as TimerCommand;
    expect(expectRefused(applyTimerCommand(run(simmer(), cmd.start, T0), hostile, ctx(T0)))).toEqual({
      code: 'invalid_input',
      message: 'addMs: At least 1 second',
    });
  });

  it('refuses a context without a known role', () => {
    const bad = { now: T0, actorRole: 'owner', actorId: 'x' } as unknown as Parameters<typeof applyTimerCommand>[2];
    expect(expectRefused(applyTimerCommand(simmer(), cmd.start, bad)).code).toBe('forbidden');
  });
});

describe('creating simple timers', () => {
  const create = (input: Parameters<typeof createTimer>[0]) =>
    createTimer(input, { ...ctx(T0), timerId: TIMER_ID, dayId: DAY_ID });

  it('rests default to their minimum: 5 min in the canner, 12 h on the cooling shelf', () => {
    // Canner rest: Penn State Extension via extension guidance; cooling 12 to 24 h: USDA Guide 1 (both confirmed).
    expect(make({ kind: 'canner-rest', label: 'Rest' })).toMatchObject({ durationMs: 5 * MIN, minimumMs: 5 * MIN });
    expect(make({ kind: 'cooling-rest', label: 'Shelf' })).toMatchObject({
      durationMs: 12 * 60 * MIN,
      minimumMs: 12 * 60 * MIN,
    });
    expect(make({ kind: 'cooling-rest', label: 'Shelf', durationMs: 24 * 60 * MIN }).durationMs).toBe(24 * 60 * MIN);
  });

  it('needs a duration for blanch, simmer, hot-hold and custom, and no tested time', () => {
    expect(expectRefused(create({ kind: 'blanch', label: 'Dip' }))).toEqual({
      code: 'invalid_input',
      message: 'Give the timer a duration.',
    });
    expect(expectRefused(create({ kind: 'simmer', label: 'S', durationMs: MIN, testedMs: MIN })).message).toBe(
      'Only process timers have a tested time.',
    );
  });

  it('refuses garbage with the field named', () => {
    expect(expectRefused(create({ kind: 'simmer', label: '  ', durationMs: MIN }))).toEqual({
      code: 'invalid_input',
      message: 'label: A label is required',
    });
    expect(expectRefused(create({ kind: 'simmer', label: 'S', durationMs: 1.5 })).message).toMatch(/^durationMs: /);
    const hostile = { kind: 'simmer', label: 'S', durationMs: MIN, state: 'done' } as unknown as Parameters<
      typeof createTimer
    >[0];
    expect(expectRefused(create(hostile)).code).toBe('invalid_input');
  });
});
