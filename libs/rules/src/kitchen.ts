import { z } from 'zod';

export const ALTITUDE_UNITS = ['ft', 'm'] as const;
export const altitudeUnitSchema = z.enum(ALTITUDE_UNITS, { error: 'Altitude unit must be ft or m' });
export type AltitudeUnit = z.infer<typeof altitudeUnitSchema>;

/** The international foot is exactly 0.3048 m (NIST Handbook 44, Appendix C). */
export const METRES_PER_FOOT = 0.3048;

/** Lowest and highest kitchen altitude Jarday accepts, in feet (below the Dead Sea shore to above any tested table). */
export const MIN_ALTITUDE_FT = -1500;
export const MAX_ALTITUDE_FT = 15000;

export const altitudeSchema = z
  .object({
    value: z.number({ error: 'Altitude must be a number' }).finite(),
    unit: altitudeUnitSchema,
  })
  .refine(
    (a) => {
      const ft = a.unit === 'ft' ? a.value : a.value / METRES_PER_FOOT;
      return ft >= MIN_ALTITUDE_FT - 1e-9 && ft <= MAX_ALTITUDE_FT + 1e-9;
    },
    {
      message: `Altitude must be between ${MIN_ALTITUDE_FT} and ${MAX_ALTITUDE_FT} ft (-457 to 4,572 m)`,
      path: ['value'],
    },
  );
export type Altitude = z.infer<typeof altitudeSchema>;

export const UNIT_SYSTEMS = ['us', 'metric'] as const;
export const unitSystemSchema = z.enum(UNIT_SYSTEMS);
export type UnitSystem = z.infer<typeof unitSystemSchema>;

export const CANNING_METHODS = ['boiling-water', 'pressure'] as const;
export const canningMethodSchema = z.enum(CANNING_METHODS, {
  error: 'Canning method must be boiling-water or pressure',
});
export type CanningMethod = z.infer<typeof canningMethodSchema>;

export const GAUGE_TYPES = ['weighted', 'dial'] as const;
export const gaugeTypeSchema = z.enum(GAUGE_TYPES, { error: 'Gauge type must be weighted or dial' });
export type GaugeType = z.infer<typeof gaugeTypeSchema>;
