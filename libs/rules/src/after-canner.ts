import { z } from 'zod';

const MINUTE_MS = 60_000;
const HOUR_MS = 60 * MINUTE_MS;

/** Jars cool undisturbed 12 to 24 hours before bands come off (USDA Complete Guide to Home Canning, Guide 1). */
export const EARLIEST_BAND_REMOVAL_HOURS = 12;
export const RECOMMENDED_BAND_REMOVAL_HOURS = 24;
/** An unsealed jar may be reprocessed, with a new lid and the full time, within 24 hours (USDA Guide 1, 1994). */
export const REPROCESS_WITHIN_HOURS = 24;
/** Use home-canned food within a year for best quality (extension guidance). */
export const BEST_QUALITY_MONTHS = 12;

function assertInstant(value: Date, name: string): number {
  if (!(value instanceof Date) || Number.isNaN(value.getTime())) {
    throw new TypeError(`${name} must be a valid date and time`);
  }
  return value.getTime();
}

/**
 * When bands may come off a load: earliest 12 h after the jars were lifted out, recommended 24 h.
 * Elapsed time is counted in exact milliseconds, so a change of clocks for summer time does not move it.
 */
export function bandRemovalTimes(liftedAt: Date): { earliestAt: Date; recommendedAt: Date } {
  const lifted = assertInstant(liftedAt, 'liftedAt');
  return {
    earliestAt: new Date(lifted + EARLIEST_BAND_REMOVAL_HOURS * HOUR_MS),
    recommendedAt: new Date(lifted + RECOMMENDED_BAND_REMOVAL_HOURS * HOUR_MS),
  };
}

/** The last moment an unsealed jar from a load may be reprocessed: 24 h after lifting. */
export function reprocessDeadline(liftedAt: Date): Date {
  return new Date(assertInstant(liftedAt, 'liftedAt') + REPROCESS_WITHIN_HOURS * HOUR_MS);
}

/** Whether an unsealed jar can still be reprocessed at `now`, and until when. */
export function reprocessWindow(liftedAt: Date, now: Date): { open: boolean; deadline: Date; remainingMs: number } {
  const deadline = reprocessDeadline(liftedAt);
  const remainingMs = Math.max(0, deadline.getTime() - assertInstant(now, 'now'));
  return { open: remainingMs > 0, deadline, remainingMs };
}

/** "3 h 5 min", rounding up to the whole minute so a refusal never says "0 min". */
export function formatRemaining(ms: number): string {
  const minutes = Math.ceil(Math.max(0, ms) / MINUTE_MS);
  const h = Math.floor(minutes / 60);
  const m = minutes % 60;
  if (h === 0) return `${m} min`;
  return m === 0 ? `${h} h` : `${h} h ${m} min`;
}

export type BandGate =
  | { allowed: true; earliestAt: Date; recommendedAt: Date; recommendedReached: boolean; message: string }
  | { allowed: false; earliestAt: Date; recommendedAt: Date; remainingMs: number; message: string };

/**
 * May the bands come off now? Allowed from exactly 12 h after lifting; refused before that (including when
 * `now` is before `liftedAt`) with the time still to wait. Taking them off earlier is for a lead to override.
 */
export function bandGate(liftedAt: Date, now: Date): BandGate {
  const { earliestAt, recommendedAt } = bandRemovalTimes(liftedAt);
  const at = assertInstant(now, 'now');
  const remainingMs = earliestAt.getTime() - at;
  if (remainingMs > 0) {
    return {
      allowed: false,
      earliestAt,
      recommendedAt,
      remainingMs,
      message: `Leave the jars undisturbed: bands can come off in ${formatRemaining(remainingMs)}, 12 hours after the jars came out.`,
    };
  }
  const recommendedReached = at >= recommendedAt.getTime();
  return {
    allowed: true,
    earliestAt,
    recommendedAt,
    recommendedReached,
    message: recommendedReached
      ? 'The jars have cooled 24 hours: remove the bands and check every seal.'
      : `Bands may come off now; waiting until 24 hours (${formatRemaining(recommendedAt.getTime() - at)} more) is better.`,
  };
}

/** A calendar date, "YYYY-MM-DD", as the kitchen's own calendar shows it. */
export const calendarDateSchema = z
  .string({ error: 'A date is required' })
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'Use a date like 2025-08-31')
  .refine((s) => {
    const [y, m, d] = s.split('-').map(Number) as [number, number, number];
    return m >= 1 && m <= 12 && d >= 1 && d <= daysInMonth(y, m);
  }, 'That day does not exist');

const isLeapYear = (year: number) => (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;

function daysInMonth(year: number, month: number): number {
  if (month === 2) return isLeapYear(year) ? 29 : 28;
  return [4, 6, 9, 11].includes(month) ? 30 : 31;
}

/**
 * Add calendar months to a date. When the day does not exist in the target month it becomes that month's last
 * day (the earlier date, never the next month): 31 Jan + 1 month is 28 or 29 Feb.
 */
export function addCalendarMonths(date: string, months: number): string {
  const [y, m, d] = calendarDateSchema.parse(date).split('-').map(Number) as [number, number, number];
  if (!Number.isInteger(months)) throw new RangeError('Add a whole number of months');
  const index = y * 12 + (m - 1) + months;
  const year = Math.floor(index / 12);
  const month = (index % 12) + 1;
  const day = Math.min(d, daysInMonth(year, month));
  const pad = (n: number, w: number) => String(n).padStart(w, '0');
  return `${pad(year, 4)}-${pad(month, 2)}-${pad(day, 2)}`;
}

/**
 * Best-quality date of a jar: 12 calendar months after the canning day (extension guidance: use within a year).
 * The canning day is the kitchen's calendar date, so no time zone is involved. A jar canned on 29 Feb is best by
 * 28 Feb of the next year.
 */
export function bestQualityDate(cannedOn: string): string {
  return addCalendarMonths(cannedOn, BEST_QUALITY_MONTHS);
}
