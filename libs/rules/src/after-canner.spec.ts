import { describe, expect, it } from 'vitest';
import {
  addCalendarMonths,
  bandGate,
  bandRemovalTimes,
  bestQualityDate,
  formatRemaining,
  reprocessDeadline,
  reprocessWindow,
} from './after-canner.js';

const MIN = 60_000;
const HOUR = 60 * MIN;
const liftedAt = new Date('2025-09-01T14:30:00.000Z');
const after = (ms: number) => new Date(liftedAt.getTime() + ms);

// Cool undisturbed 12 to 24 hours, then remove bands (USDA Guide 1, confirmed).
describe('band removal', () => {
  it('earliest 12 h and recommended 24 h after lifting', () => {
    expect(bandRemovalTimes(liftedAt)).toEqual({
      earliestAt: new Date('2025-09-02T02:30:00.000Z'),
      recommendedAt: new Date('2025-09-02T14:30:00.000Z'),
    });
  });

  it('refuses at 11 h 59 min and 11 h 59 min 59.999 s, allows at exactly 12 h', () => {
    expect(bandGate(liftedAt, after(11 * HOUR + 59 * MIN))).toMatchObject({
      allowed: false,
      remainingMs: MIN,
      message: 'Leave the jars undisturbed: bands can come off in 1 min, 12 hours after the jars came out.',
    });
    expect(bandGate(liftedAt, after(12 * HOUR - 1))).toMatchObject({ allowed: false, remainingMs: 1 });
    expect(bandGate(liftedAt, after(12 * HOUR))).toMatchObject({
      allowed: true,
      recommendedReached: false,
      message: 'Bands may come off now; waiting until 24 hours (12 h more) is better.',
    });
  });

  it('says the full wait right after lifting, and when the clock reads earlier than the lift', () => {
    expect(bandGate(liftedAt, liftedAt)).toMatchObject({ allowed: false, remainingMs: 12 * HOUR });
    expect(bandGate(liftedAt, liftedAt).message).toContain('in 12 h,');
    expect(bandGate(liftedAt, after(-5 * MIN))).toMatchObject({ allowed: false, remainingMs: 12 * HOUR + 5 * MIN });
  });

  it('reports the remaining time in hours and minutes', () => {
    expect(bandGate(liftedAt, after(8 * HOUR + 48 * MIN)).message).toContain('in 3 h 12 min,');
  });

  it('marks the recommended 24 h', () => {
    expect(bandGate(liftedAt, after(24 * HOUR - 1))).toMatchObject({ allowed: true, recommendedReached: false });
    expect(bandGate(liftedAt, after(24 * HOUR))).toMatchObject({
      allowed: true,
      recommendedReached: true,
      message: 'The jars have cooled 24 hours: remove the bands and check every seal.',
    });
  });

  it('refuses invalid dates', () => {
    expect(() => bandGate(new Date('nonsense'), liftedAt)).toThrow('liftedAt must be a valid date and time');
    expect(() => bandGate(liftedAt, new Date(Number.NaN))).toThrow('now must be a valid date and time');
  });
});

// An unsealed jar: new lid and reprocess within 24 hours (USDA Guide 1, 1994, confirmed).
describe('reprocessing an unsealed jar', () => {
  it('must start within 24 h of lifting', () => {
    expect(reprocessDeadline(liftedAt)).toEqual(new Date('2025-09-02T14:30:00.000Z'));
    expect(reprocessWindow(liftedAt, after(24 * HOUR - 1))).toMatchObject({ open: true, remainingMs: 1 });
    expect(reprocessWindow(liftedAt, after(24 * HOUR))).toMatchObject({ open: false, remainingMs: 0 });
  });
});

describe('formatRemaining', () => {
  it('rounds up to the whole minute', () => {
    expect(formatRemaining(1)).toBe('1 min');
    expect(formatRemaining(MIN)).toBe('1 min');
    expect(formatRemaining(MIN + 1)).toBe('2 min');
    expect(formatRemaining(2 * HOUR)).toBe('2 h');
    expect(formatRemaining(11 * HOUR + 59 * MIN)).toBe('11 h 59 min');
    expect(formatRemaining(-5)).toBe('0 min');
  });
});

// Use within one year for best quality (extension FAQ, confirmed; USDA 2015 wording from memory).
describe('bestQualityDate: 12 calendar months after the canning day', () => {
  it.each([
    ['2025-09-01', '2026-09-01'],
    ['2025-12-31', '2026-12-31'],
    ['2024-02-29', '2025-02-28'], // no 29 Feb next year: the last day of February
    ['2027-02-28', '2028-02-28'], // a 28 Feb stays 28 Feb even into a leap year
  ])('%s -> %s', (cannedOn, best) => {
    expect(bestQualityDate(cannedOn)).toBe(best);
  });

  it('clamps month ends to the target month', () => {
    expect(addCalendarMonths('2025-01-31', 1)).toBe('2025-02-28');
    expect(addCalendarMonths('2024-01-31', 1)).toBe('2024-02-29');
    expect(addCalendarMonths('2025-03-31', -1)).toBe('2025-02-28');
    expect(addCalendarMonths('2025-08-31', 13)).toBe('2026-09-30');
    expect(addCalendarMonths('2100-02-28', 12)).toBe('2101-02-28');
  });

  it('refuses dates that do not exist', () => {
    expect(() => bestQualityDate('2025-02-29')).toThrow('That day does not exist');
    expect(() => bestQualityDate('1/9/2025')).toThrow('Use a date like 2025-08-31');
    expect(() => addCalendarMonths('2025-01-01', 1.5)).toThrow(RangeError);
  });
});
