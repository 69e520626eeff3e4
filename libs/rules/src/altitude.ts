import { z } from 'zod';
import { METRES_PER_FOOT, type Altitude } from './kitchen.js';

/**
 * Feet to metres with the exact international foot, 0.3048 m (NIST Handbook 44, Appendix C).
 */
export function feetToMetres(feet: number): number {
  return feet * METRES_PER_FOOT;
}

/** Metres to feet with the exact international foot (NIST Handbook 44, Appendix C). */
export function metresToFeet(metres: number): number {
  return metres / METRES_PER_FOOT;
}

/**
 * Divisions of a foot kept when an altitude is normalised. Dividing by 0.3048 can leave a few units in the
 * last binary place (about 1e-13 ft); snapping to a millionth of a foot removes that noise without ever moving
 * a real height across a whole-foot band edge.
 */
const SNAP_PER_FOOT = 1e6;

/**
 * An altitude in feet, whichever unit it was given in.
 *
 * Metre input is converted exactly and only snapped to a millionth of a foot: it is never rounded to a whole
 * foot. So 304.8 m is exactly 1,000 ft (the first band), while 305 m is 1,000.66 ft and falls in the next band.
 * Any height above a published bound, by however little, takes the next band's (longer) time.
 */
export function altitudeInFeet(altitude: Altitude): number {
  const feet = altitude.unit === 'ft' ? altitude.value : metresToFeet(altitude.value);
  // `+ 0` turns a snapped -0 into 0 so equal altitudes compare and print alike.
  return Math.round(feet * SNAP_PER_FOOT) / SNAP_PER_FOOT + 0;
}

/** An altitude in metres, whichever unit it was given in (exact conversion, not rounded). */
export function altitudeInMetres(altitude: Altitude): number {
  return altitude.unit === 'm' ? altitude.value : feetToMetres(altitude.value);
}

/**
 * Upper bounds of altitude bands in whole feet, each INCLUSIVE: `[1000, 3000, 6000, null]` reads
 * 0-1,000 / 1,001-3,000 / 3,001-6,000 / above 6,000 ft, as the USDA Complete Guide to Home Canning prints its
 * tables. `null` may only come last and means "no upper limit". A list that ends in a number has no time for
 * altitudes above that number.
 */
export const bandBoundsSchema = z
  .array(
    z
      .number({ error: 'A band bound must be a number of feet or null' })
      .int('Band bounds are whole feet')
      .positive('Band bounds must be above 0 ft')
      .nullable(),
    { error: 'Give the altitude bands as a list of upper bounds in feet' },
  )
  .min(1, 'Give at least one altitude band')
  .superRefine((bounds, ctx) => {
    bounds.forEach((bound, i) => {
      if (bound === null && i !== bounds.length - 1) {
        ctx.addIssue({ code: 'custom', path: [i], message: 'Only the last band may be open-ended (null)' });
      }
      const previous = bounds[i - 1];
      if (i > 0 && bound !== null && previous !== null && previous !== undefined && bound <= previous) {
        ctx.addIssue({
          code: 'custom',
          path: [i],
          message: `Band bounds must strictly increase: ${formatFeet(bound)} ft follows ${formatFeet(previous)} ft`,
        });
      }
    });
  });
export type BandBounds = z.infer<typeof bandBoundsSchema>;

/** One altitude band, as resolved for a given altitude. */
export interface AltitudeBand {
  /** Position of the band in its table, 0 for the lowest. */
  index: number;
  /** Lowest whole foot printed for the band (0 for the first band, which also covers places below sea level). */
  fromFt: number;
  /** Inclusive upper bound in feet, or null for the open top band. */
  toFt: number | null;
  /** The band as the tables print it, e.g. "1,001–3,000 ft". */
  label: string;
}

/** Whole feet with thousands separators, independent of the runtime's locale data. */
export function formatFeet(feet: number): string {
  const sign = feet < 0 ? '-' : '';
  return sign + String(Math.round(Math.abs(feet))).replace(/\B(?=(\d{3})+(?!\d))/g, ',');
}

/** The label of band `index` of a bound list, e.g. "0–1,000 ft", "1,001–6,000 ft", "Above 6,000 ft". */
export function bandLabel(bounds: readonly (number | null)[], index: number): string {
  const to = bounds[index];
  const from = index === 0 ? 0 : (bounds[index - 1] ?? 0) + 1;
  if (to === undefined) throw new RangeError(`There is no band ${index} in a table of ${bounds.length} bands`);
  if (to === null) return index === 0 ? 'All altitudes' : `Above ${formatFeet(from - 1)} ft`;
  return `${formatFeet(from)}–${formatFeet(to)} ft`;
}

/**
 * The band an altitude falls in, or null when it lies above the last bound of a table that ends in a number.
 * Upper bounds are inclusive: with `[1000, 6000, null]`, 1,000 ft is the first band and 1,000.01 ft the second.
 */
export function findBand(bounds: readonly (number | null)[], altitude: Altitude): AltitudeBand | null {
  const feet = altitudeInFeet(altitude);
  const index = bounds.findIndex((bound) => bound === null || feet <= bound);
  if (index < 0) return null;
  return {
    index,
    fromFt: index === 0 ? 0 : (bounds[index - 1] ?? 0) + 1,
    toFt: bounds[index] ?? null,
    label: bandLabel(bounds, index),
  };
}
