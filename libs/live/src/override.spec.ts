import { describe, expect, it } from 'vitest';
import { applyTimerCommand } from './apply.js';
import type { NewTimer } from './commands.js';
import { createTimer } from './create.js';
import { checkMinimum } from './minimum-gate.js';
import { fireDue } from './schedule.js';
import {
  boilingWater,
  cmd,
  ctx,
  DAY_ID,
  expectOk,
  expectRefused,
  LEAD,
  MIN,
  pressure,
  run,
  T0,
} from './testing/fixtures.js';
import { TIMER_ID } from './testing/fixtures.js';
import type { LiveRole } from './timer.js';

// Half-pint hot-packed jam, 1,001-6,000 ft: 10 min (USDA Guide 7, confirmed from a secondary copy).
const TESTED = 10 * MIN;
const create = (input: NewTimer, role: LiveRole = 'helper') =>
  createTimer(input, { ...ctx(T0, role), timerId: TIMER_ID, dayId: DAY_ID });
const jam = (extra: Partial<NewTimer> = {}): NewTimer => ({
  kind: 'process',
  label: 'Jam, half-pints',
  testedMs: TESTED,
  ...extra,
});
const belowTested = {
  code: 'below_minimum',
  message: 'The tested process time for this load is 10 min; a shorter time needs a lead’s override with a reason.',
};

describe('a process time below the tested time', () => {
  it('is refused for a helper and for a lead without an override', () => {
    expect(expectRefused(create(jam({ durationMs: 8 * MIN })))).toEqual(belowTested);
    expect(expectRefused(create(jam({ durationMs: 8 * MIN }), 'lead'))).toEqual(belowTested);
  });

  it('is refused for a helper even with an override', () => {
    const withOverride = jam({ durationMs: 8 * MIN, override: { reason: 'Tested at home' } });
    expect(expectRefused(create(withOverride))).toEqual({
      code: 'forbidden',
      message: 'Only a lead can override a tested or safe minimum time.',
    });
  });

  it('needs a reason that is not blank', () => {
    expect(expectRefused(create(jam({ durationMs: 8 * MIN, override: { reason: '   ' } }), 'lead'))).toEqual({
      code: 'invalid_input',
      message: 'override.reason: A reason is required',
    });
    // The gate itself refuses a blank reason too, for callers that skip the schema.
    expect(checkMinimum('process', 8 * MIN, TESTED, { reason: ' ' }, ctx(T0, 'lead'))).toEqual({
      ok: false,
      error: { code: 'override_reason_required', message: 'An override needs a reason, so the journal shows why.' },
    });
  });

  it('goes ahead for a lead with a reason, and the timer and the journal keep who and why', () => {
    const result = expectOk(
      create(jam({ durationMs: 8 * MIN, override: { reason: '  Re-run of a load that had 8 min  ' } }), 'lead'),
    );
    const record = {
      byUserId: LEAD,
      reason: 'Re-run of a load that had 8 min',
      at: T0,
      durationMs: 8 * MIN,
      minimumMs: TESTED,
    };
    expect(result.timer.overrides).toEqual([record]);
    expect(result.timer).toMatchObject({ durationMs: 8 * MIN, minimumMs: TESTED });
    expect(result.events.map((e) => e.type)).toEqual(['timer.created', 'timer.override']);
    expect(result.events[1]?.detail).toEqual({ reason: record.reason, durationMs: 8 * MIN, minimumMs: TESTED });
  });

  it('needs no override at or above the tested time, and records none that was sent anyway', () => {
    expect(expectOk(create(jam())).timer).toMatchObject({ durationMs: TESTED, overrides: [] });
    const longer = expectOk(create(jam({ durationMs: 15 * MIN, override: { reason: 'not needed' } }), 'lead'));
    expect(longer.timer.overrides).toEqual([]);
    expect(longer.events.map((e) => e.type)).toEqual(['timer.created']);
  });

  it('a process timer needs its tested time and cannot start before the boil', () => {
    expect(expectRefused(create({ kind: 'process', label: 'No time', durationMs: TESTED })).message).toBe(
      'A process timer needs the tested process time for the recipe at this altitude.',
    );
    expect(expectRefused(create(jam({ startNow: true }))).message).toBe(
      'A process timer starts only from a confirmed rolling boil or from pressure.',
    );
  });
});

describe('set process time', () => {
  const set = (durationMs: number, reason?: string) =>
    ({ type: 'set-duration', durationMs, ...(reason === undefined ? {} : { override: { reason } }) }) as const;

  it('lengthens freely, and moves a running deadline from the boil', () => {
    const running = run(run(boilingWater(45 * MIN), cmd.heating, T0), cmd.boil, T0 + 20 * MIN);
    const longer = expectOk(applyTimerCommand(running, set(50 * MIN), ctx(T0 + 30 * MIN)));
    expect(longer.timer).toMatchObject({ durationMs: 50 * MIN, deadlineAt: T0 + 70 * MIN });
    expect(longer.events[0]).toMatchObject({
      type: 'timer.duration-set',
      detail: { durationMs: 50 * MIN, previousDurationMs: 45 * MIN, deadlineAt: T0 + 70 * MIN },
    });
  });

  it('shortens below the tested time only with a lead override, kept with the earlier ones', () => {
    const armed = boilingWater(45 * MIN);
    expect(expectRefused(applyTimerCommand(armed, set(40 * MIN), ctx(T0)))).toMatchObject({ code: 'below_minimum' });
    expect(expectRefused(applyTimerCommand(armed, set(40 * MIN, 'why'), ctx(T0)))).toMatchObject({ code: 'forbidden' });
    const shorter = expectOk(applyTimerCommand(armed, set(40 * MIN, 'Jars were hot-filled twice'), ctx(T0, 'lead')));
    expect(shorter.timer.overrides).toHaveLength(1);
    expect(shorter.events.map((e) => e.type)).toEqual(['timer.duration-set', 'timer.override']);
    const lower = expectOk(applyTimerCommand(shorter.timer, set(35 * MIN, 'Second thought'), ctx(T0 + 1, 'lead')));
    expect(lower.timer.overrides.map((o) => o.durationMs)).toEqual([40 * MIN, 35 * MIN]);
  });

  it('may shorten back towards the tested time without an override', () => {
    const longer = run(boilingWater(45 * MIN), set(60 * MIN), T0);
    expect(run(longer, set(45 * MIN), T0 + 1).durationMs).toBe(45 * MIN);
  });

  it('cannot end the process in the past, and the same time changes nothing', () => {
    const running = run(run(boilingWater(45 * MIN), cmd.heating, T0), cmd.boil, T0);
    expect(expectRefused(applyTimerCommand(running, set(50 * MIN), ctx(T0 + 51 * MIN))).code).toBe('invalid_state');
    const lengthenLate = applyTimerCommand(run(running, set(60 * MIN), T0 + MIN), set(50 * MIN), ctx(T0 + 55 * MIN));
    expect(expectRefused(lengthenLate)).toEqual({
      code: 'invalid_input',
      message: 'The load has already processed 55 min; a new process time must be longer than that.',
    });
    expect(expectOk(applyTimerCommand(running, set(45 * MIN), ctx(T0 + MIN)))).toMatchObject({ noop: true });
  });

  it('is closed once the load has had its time', () => {
    const done = expectOk(fireDue(run(run(boilingWater(), cmd.heating, T0), cmd.boil, T0), T0 + 45 * MIN)).timer;
    expect(expectRefused(applyTimerCommand(done, set(50 * MIN), ctx(T0 + 46 * MIN)))).toEqual({
      code: 'invalid_state',
      message: 'The process time can only change before the load has finished processing.',
    });
  });

  it('works the same on a pressure process, coming up or at pressure', () => {
    const venting = run(pressure(25 * MIN), cmd.vent, T0);
    expect(expectRefused(applyTimerCommand(venting, set(20 * MIN), ctx(T0 + MIN))).code).toBe('below_minimum');
    expect(run(venting, set(30 * MIN), T0 + MIN).durationMs).toBe(30 * MIN);
  });
});

describe('rests below their minimum', () => {
  it('a cooling rest under 12 h needs a lead override (USDA Guide 1: 12 to 24 h undisturbed)', () => {
    const short = { kind: 'cooling-rest', label: 'Shelf', durationMs: 6 * 60 * MIN } as const;
    expect(expectRefused(create(short))).toEqual({
      code: 'below_minimum',
      message:
        'Jars cool undisturbed at least 12 h before the bands come off; a shorter time needs a lead’s override ' +
        'with a reason.',
    });
    const overridden = expectOk(create({ ...short, override: { reason: 'Moving house tonight' } }, 'lead'));
    expect(overridden.timer.overrides[0]).toMatchObject({ minimumMs: 12 * 60 * MIN, durationMs: 6 * 60 * MIN });
  });

  it('a canner rest under 5 min needs a lead override', () => {
    const error = expectRefused(create({ kind: 'canner-rest', label: 'Rest', durationMs: 2 * MIN }));
    expect(error.message).toBe(
      'Jars rest 5 min in the canner, heat off and lid off, before they come out; a shorter time needs a lead’s ' +
        'override with a reason.',
    );
  });
});
