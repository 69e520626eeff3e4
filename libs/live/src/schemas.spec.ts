import { describe, expect, it } from 'vitest';
import { newTimerSchema, timerCommandSchema } from './commands.js';
import { timerEventSchema } from './events.js';
import { formatDuration } from './format.js';
import { fireDue } from './schedule.js';
import { boilingWater, cmd, expectOk, MIN, run, T0 } from './testing/fixtures.js';
import { parseTimer, timerSchema, type Timer } from './timer.js';

const running = (): Timer => run(run(boilingWater(), cmd.heating, T0), cmd.boil, T0);

describe('timerSchema', () => {
  it('reads back every stored shape the core makes', () => {
    const fired = expectOk(fireDue(running(), T0 + 45 * MIN));
    for (const t of [boilingWater(), running(), fired.timer])
      expect(parseTimer(JSON.parse(JSON.stringify(t)))).toEqual(t);
    for (const e of fired.events) expect(timerEventSchema.parse(e)).toEqual(e);
  });

  it('refuses a row whose state does not belong to its kind, or whose clock disagrees with its state', () => {
    const base = running();
    const issues = (value: unknown) => timerSchema.safeParse(value).error?.issues.map((i) => i.message) ?? [];
    expect(issues({ ...base, state: 'paused', deadlineAt: null, pausedRemainingMs: 1 })).toContain(
      'The state does not belong to this kind of timer',
    );
    expect(issues({ ...base, deadlineAt: null })).toContain('A deadline is set exactly while a clock counts');
    expect(issues({ ...base, pausedRemainingMs: 5 })).toContain(
      'The time left is kept exactly while a timer is paused',
    );
    expect(issues({ ...base, extra: 1 }).length).toBeGreaterThan(0);
    expect(() => parseTimer({ id: 'x' })).toThrow();
  });
});

describe('command schemas refuse garbage', () => {
  const accepts = (value: unknown) => timerCommandSchema.safeParse(value).success;

  it('accepts the verbs, strictly shaped', () => {
    expect(timerCommandSchema.parse({ type: 'rolling-boil' })).toEqual({ type: 'rolling-boil' });
    expect(timerCommandSchema.parse({ type: 'add-time', addMs: 15_000 })).toEqual({ type: 'add-time', addMs: 15_000 });
    expect(
      timerCommandSchema.parse({ type: 'set-duration', durationMs: 40 * MIN, override: { reason: ' Re-run ' } }),
    ).toEqual({ type: 'set-duration', durationMs: 40 * MIN, override: { reason: 'Re-run' } });
  });

  it('refuses unknown verbs, extra fields, wrong types and out-of-range numbers', () => {
    for (const value of [
      null,
      'rolling-boil',
      {},
      { type: 'explode' },
      { type: 'rolling-boil', deadlineAt: 0 },
      { type: 'add-time' },
      { type: 'add-time', addMs: '60000' },
      { type: 'add-time', addMs: 0.5 },
      { type: 'add-time', addMs: -60_000 },
      { type: 'add-time', addMs: 49 * 60 * MIN },
      { type: 'add-time', addMs: Number.NaN },
      { type: 'set-duration', durationMs: 40 * MIN, override: { reason: '' } },
      { type: 'set-duration', durationMs: 40 * MIN, override: { reason: 'x'.repeat(501) } },
      { type: 'set-duration', durationMs: 40 * MIN, override: { reason: 'ok', byUserId: 'someone-else' } },
    ]) {
      expect(accepts(value), JSON.stringify(value)).toBe(false);
    }
  });

  it('new timers: bounded label, known kind, uuid load, no client-chosen state', () => {
    const ok = { kind: 'simmer', label: 'Salsa', durationMs: 10 * MIN };
    expect(newTimerSchema.safeParse(ok).success).toBe(true);
    for (const value of [
      { ...ok, kind: 'oven' },
      { ...ok, label: 'x'.repeat(81) },
      { ...ok, loadId: 'load-1' },
      { ...ok, state: 'running' },
      { ...ok, id: 'mine' },
      { ...ok, startNow: 'yes' },
    ]) {
      expect(newTimerSchema.safeParse(value).success, JSON.stringify(value)).toBe(false);
    }
  });
});

describe('formatDuration', () => {
  it('writes hours, minutes and seconds, rounding up', () => {
    expect(formatDuration(45 * MIN)).toBe('45 min');
    expect(formatDuration(90 * MIN)).toBe('1 h 30 min');
    expect(formatDuration(12 * 60 * MIN)).toBe('12 h');
    expect(formatDuration(30_000)).toBe('30 s');
    expect(formatDuration(90_001)).toBe('1 min 31 s');
    expect(formatDuration(0)).toBe('0 s');
    expect(formatDuration(-5)).toBe('0 s');
  });
});
