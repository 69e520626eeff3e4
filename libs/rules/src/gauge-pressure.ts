import { findBand, type AltitudeBand } from './altitude.js';
import type { Altitude, GaugeType } from './kitchen.js';

/**
 * Standard gauge pressures for pressure canning by altitude (USDA Complete Guide to Home Canning, Guide 1;
 * PNW 421 extension bulletin). Upper bounds in feet are inclusive, as the tables print them.
 *
 * The dial value for 8,001-10,000 ft (15 lb) is from memory: the USDA tables we could read stop at 8,000 ft.
 * Nothing is given above 10,000 ft, so Jarday refuses there rather than extrapolate.
 */
export const GAUGE_PRESSURE_TABLE: Record<GaugeType, { bounds: readonly number[]; pounds: readonly number[] }> = {
  weighted: { bounds: [1000, 10000], pounds: [10, 15] },
  dial: { bounds: [1000, 2000, 4000, 6000, 8000, 10000], pounds: [11, 11, 12, 13, 14, 15] },
};

/** Highest altitude, in feet, for which Jarday gives a canning pressure. */
export const MAX_PRESSURE_ALTITUDE_FT = 10000;

/** Minutes to vent (exhaust) steam from a pressure canner before closing the vent (USDA Guide 1). */
export const VENT_MINUTES = 10;

export type GaugePressure =
  | { ok: true; pounds: number; gauge: GaugeType; band: AltitudeBand }
  | { ok: false; reason: { code: 'altitude-beyond-table'; message: string } };

/** The gauge pressure, in pounds per square inch, for a gauge type at an altitude. */
export function gaugePressure(gauge: GaugeType, altitude: Altitude): GaugePressure {
  const table = GAUGE_PRESSURE_TABLE[gauge];
  const band = findBand(table.bounds, altitude);
  const pounds = band === null ? undefined : table.pounds[band.index];
  if (band === null || pounds === undefined) {
    return {
      ok: false,
      reason: {
        code: 'altitude-beyond-table',
        message:
          'The pressure tables stop at 10,000 ft; Jarday gives no canning pressure above that. ' +
          'Ask your local extension service.',
      },
    };
  }
  return { ok: true, pounds, gauge, band };
}
