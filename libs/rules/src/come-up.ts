import { z } from 'zod';
import { boilingPoint } from './boiling-point.js';
import { altitudeSchema, type Altitude } from './kitchen.js';

const MINUTE_MS = 60_000;

/**
 * A canner usually takes 20-30 minutes of heating before its water boils (USDA Complete Guide to Home Canning,
 * Guide 1, confirmed); a large, full canner can take much longer. The plan allows the upper end.
 */
export const PUBLISHED_COME_UP_MINUTES = { min: 20, max: 30 } as const;

/**
 * Density of liquid water at 25 °C and 0.101325 MPa, kg/m³ (IAPWS-95; from memory). It falls to about 958 kg/m³
 * at 100 °C; the room-temperature value is used because the canner is filled with water measured cold.
 */
export const WATER_DENSITY_KG_PER_M3 = 997.047;
/**
 * Specific isobaric heat capacity of liquid water at 25 °C, J/(kg·K) (IAPWS-95; from memory). Between 20 °C and
 * 100 °C it stays within about 1 % of this value (4.18-4.22 kJ/(kg·K)).
 */
export const WATER_SPECIFIC_HEAT_J_PER_KG_K = 4181.3;
/**
 * Share of the burner's rated power that ends up in the water. An assumption, not a published figure: a round
 * number between typical gas (about 40 %) and electric coil (about 70-75 %) cooktop efficiencies (US Department of
 * Energy cooking-product test data, from memory). Kitchens with history get their own figure instead.
 */
export const ASSUMED_BURNER_EFFICIENCY = 0.6;
/**
 * Water temperature when the lid goes on, °F: canner water is preheated to 140 °F for raw-packed and 180 °F for
 * hot-packed jars (USDA Guide 1). The lower one is the default so the estimate errs long (heating starts early).
 */
export const DEFAULT_LID_ON_WATER_F = 140;
/** Logged come-ups outside this range are taken to be mis-taps (a boil confirmed at once, or a timer forgotten). */
export const PLAUSIBLE_COME_UP_MS = { min: 1 * MINUTE_MS, max: 3 * 60 * MINUTE_MS } as const;

export const comeUpInputSchema = z.object({
  /** Past come-ups of this canner, lid on to rolling boil, in ms. */
  history: z.array(z.number()).default([]),
  waterLitres: z.number().positive('Water must be more than 0 L').max(200, 'At most 200 L').nullish(),
  burnerWatts: z.number().positive('Burner power must be more than 0 W').max(20_000, 'At most 20,000 W').nullish(),
  altitude: altitudeSchema,
  /** Water temperature when heating starts, °F. */
  fromF: z.number().min(32).max(211).default(DEFAULT_LID_ON_WATER_F),
  efficiency: z.number().gt(0).max(1).default(ASSUMED_BURNER_EFFICIENCY),
});
export type ComeUpInput = z.input<typeof comeUpInputSchema>;

export type ComeUpSource = 'history' | 'physics' | 'published';

export interface ComeUpEstimate {
  /** The come-up the plan uses, in ms and minutes. */
  ms: number;
  minutes: number;
  source: ComeUpSource;
  /** How it was found, in words a cook can check. */
  detail: string;
  /** history: the number of logged come-ups used. */
  samples: number;
  /** published: the range the upper end was taken from. */
  range: { min: number; max: number } | null;
}

/** The median; for an even count, the mean of the two middle values. */
export function median(values: readonly number[]): number {
  if (values.length === 0) throw new RangeError('The median of no values is undefined');
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  const at = (i: number) => sorted[i] ?? Number.NaN;
  return sorted.length % 2 === 1 ? at(mid) : (at(mid - 1) + at(mid)) / 2;
}

/**
 * Seconds of heating from `fromF` to the boiling point at the altitude (ICAO standard atmosphere and IAPWS-IF97):
 * Q = ρ V c ΔT, over the burner's power times its efficiency. Losses from the canner's walls are not counted
 * beyond the efficiency, so a very large canner on a small burner takes longer than this.
 */
export function heatingSeconds(input: {
  waterLitres: number;
  burnerWatts: number;
  altitude: Altitude;
  fromF?: number;
  efficiency?: number;
}): number {
  const fromC = ((input.fromF ?? DEFAULT_LID_ON_WATER_F) - 32) / 1.8;
  const deltaK = Math.max(0, boilingPoint(input.altitude).celsius - fromC);
  const kg = (input.waterLitres / 1000) * WATER_DENSITY_KG_PER_M3;
  const joules = kg * WATER_SPECIFIC_HEAT_J_PER_KG_K * deltaK;
  return joules / (input.burnerWatts * (input.efficiency ?? ASSUMED_BURNER_EFFICIENCY));
}

const roundMinutes = (ms: number) => Math.round(ms / MINUTE_MS);
const fmt = (n: number) => n.toLocaleString('en-US', { maximumFractionDigits: 1 });

/**
 * How long a canner takes from lid on to a full rolling boil, in this order of preference: the median of the
 * kitchen's own logged come-ups for that canner; else a physics estimate from its water volume and burner power;
 * else the published 20-30 minutes (the upper end). The answer says which it used.
 */
export function estimateComeUp(input: ComeUpInput): ComeUpEstimate {
  const v = comeUpInputSchema.parse(input);
  const logged = v.history.filter(
    (ms) => Number.isFinite(ms) && ms >= PLAUSIBLE_COME_UP_MS.min && ms <= PLAUSIBLE_COME_UP_MS.max,
  );
  if (logged.length > 0) {
    const ms = median(logged);
    const loads = logged.length === 1 ? '1 logged load' : `${logged.length} logged loads`;
    return {
      ms,
      minutes: ms / MINUTE_MS,
      source: 'history',
      detail: `learned from ${loads}: median ${roundMinutes(ms)} min`,
      samples: logged.length,
      range: null,
    };
  }
  if (v.waterLitres != null && v.burnerWatts != null) {
    const ms = heatingSeconds({ ...v, waterLitres: v.waterLitres, burnerWatts: v.burnerWatts }) * 1000;
    return {
      ms,
      minutes: ms / MINUTE_MS,
      source: 'physics',
      detail:
        `estimated from ${fmt(v.waterLitres)} L and ${fmt(v.burnerWatts)} W: about ${roundMinutes(ms)} min ` +
        `from ${fmt(v.fromF)} °F to ${fmt(boilingPoint(v.altitude).fahrenheit)} °F, ` +
        `${Math.round(v.efficiency * 100)} % of the burner's power reaching the water`,
      samples: 0,
      range: null,
    };
  }
  const { min, max } = PUBLISHED_COME_UP_MINUTES;
  return {
    ms: max * MINUTE_MS,
    minutes: max,
    source: 'published',
    detail: `published range ${min}–${max} min, no history: the plan allows ${max} min`,
    samples: 0,
    range: { min, max },
  };
}
