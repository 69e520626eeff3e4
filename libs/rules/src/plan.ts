import { z } from 'zod';
import { altitudeInFeet, type AltitudeBand } from './altitude.js';
import { cautionsFor, type CautionId } from './cautions.js';
import { gaugePressure, VENT_MINUTES } from './gauge-pressure.js';
import {
  acidPerJar,
  headspaceOf,
  jarPreparation,
  type AcidOption,
  type Headspace,
  type JarPreparation,
} from './jar-prep.js';
import { JAR_SIZE_LABELS, jarSizeSchema, type JarSize } from './jars.js';
import { altitudeSchema, canningMethodSchema, gaugeTypeSchema, type CanningMethod, type GaugeType } from './kitchen.js';
import {
  boilingWaterAfter,
  boilingWaterTiming,
  PREHEAT_WATER_F,
  pressureAfter,
  pressureTiming,
  WATER_OVER_JARS_INCHES,
  type AfterProcess,
  type Timing,
} from './process-steps.js';
import { boilingWaterMinutes, describeRow, packStyleSchema, testedRows, type PackStyle } from './process-table.js';
import type { ProductClass } from './product-class.js';
import { recipeRulesSchema } from './recipe.js';

/** What the rules need to know about a canner. Extra fields (id, name) are ignored. */
export const cannerRulesSchema = z
  .object({
    method: canningMethodSchema,
    gauge: gaugeTypeSchema.nullable(),
    capacity: z.partialRecord(jarSizeSchema, z.number().int('Whole jars only').nonnegative('At least 0 jars')),
  })
  .refine((c) => (c.method === 'pressure' ? c.gauge !== null : c.gauge === null), {
    message: 'A pressure canner needs a gauge type (weighted or dial); a boiling-water canner has none',
    path: ['gauge'],
  });
export type CannerRules = z.infer<typeof cannerRulesSchema>;

export const planInputSchema = z.object({
  // A stored recipe may carry more fields (an id, sources); only the rules' fields are read.
  recipe: recipeRulesSchema.loose(),
  jarSize: jarSizeSchema,
  pack: packStyleSchema,
  altitude: altitudeSchema,
  canner: cannerRulesSchema,
});
export type PlanInput = z.input<typeof planInputSchema>;

export const PLAN_REFUSAL_CODES = [
  'invalid-input',
  'low-acid-needs-pressure',
  'method-mismatch',
  'no-tested-time',
  'canner-jar-size',
  'altitude-beyond-table',
] as const;
export type PlanRefusalCode = (typeof PLAN_REFUSAL_CODES)[number];

export interface ProcessPlan {
  recipeName: string;
  /** False for a recipe not tested by a recognised source: show it, with the tested-recipes caution. */
  tested: boolean;
  productClass: ProductClass;
  method: CanningMethod;
  jarSize: JarSize;
  pack: PackStyle;
  altitudeFt: number;
  /** The altitude band that set the time (boiling water) or the pressure (pressure canning). */
  band: AltitudeBand;
  minutes: number;
  pressure: { pounds: number; gauge: GaugeType } | null;
  ventMinutes: number | null;
  /** Boiling water only: water depth over the jars and the temperature to preheat it to. */
  water: { overJarsInches: number; preheatF: number } | null;
  timing: Timing;
  afterProcess: AfterProcess;
  jarPreparation: JarPreparation;
  headspace: Headspace;
  /** Add any one option to each jar; empty when the recipe needs no added acid. */
  acidPerJar: AcidOption[];
  /** Jars of this size the canner holds in one load. */
  jarsPerLoad: number;
  cautionIds: CautionId[];
}

export type PlanResult =
  { ok: true; plan: ProcessPlan } | { ok: false; reason: { code: PlanRefusalCode; message: string } };

const METHOD_NAMES: Record<CanningMethod, string> = { 'boiling-water': 'boiling-water', pressure: 'pressure' };
const refuse = (code: PlanRefusalCode, message: string): PlanResult => ({ ok: false, reason: { code, message } });

/**
 * Plan one canner load: the tested time for the recipe, jar size, pack and altitude, and everything that goes
 * with it. Refuses, with a stable code and a message a cook can act on, when there is no tested process.
 */
export function planProcess(input: PlanInput): PlanResult {
  const parsed = planInputSchema.safeParse(input);
  if (!parsed.success) {
    const message = parsed.error.issues.map((i) => (i.path.length ? `${i.path.join('.')}: ` : '') + i.message);
    return refuse('invalid-input', message.join('; '));
  }
  const { recipe, jarSize, pack, altitude, canner } = parsed.data;
  const method = canner.method;
  const name = recipe.name;

  if (recipe.productClass === 'low-acid' && method === 'boiling-water') {
    return refuse(
      'low-acid-needs-pressure',
      `${name} is a low-acid food and must be processed in a pressure canner; a boiling-water canner cannot make it safe.`,
    );
  }
  const table = method === 'boiling-water' ? recipe.processing.boilingWater : recipe.processing.pressure;
  if (table === undefined) {
    const other: CanningMethod = method === 'boiling-water' ? 'pressure' : 'boiling-water';
    return refuse(
      'method-mismatch',
      `${name} has a tested ${METHOD_NAMES[other]} process only; choose a ${METHOD_NAMES[other]} canner.`,
    );
  }
  const row = describeRow(jarSize, pack);
  if (!table.rows.some((r) => r.jarSize === jarSize && r.pack === pack)) {
    const tested = testedRows(recipe.processing, method).map((r) => describeRow(r.jarSize, r.pack));
    return refuse(
      'no-tested-time',
      `${name} has no tested ${METHOD_NAMES[method]} time for ${row}. Tested: ${tested.join('; ')}.`,
    );
  }
  const jarsPerLoad = canner.capacity[jarSize] ?? 0;
  if (jarsPerLoad < 1) {
    return refuse(
      'canner-jar-size',
      `This canner is not set up to hold ${JAR_SIZE_LABELS[jarSize].toLowerCase()} jars.`,
    );
  }
  const acid = acidPerJar(recipe.acidification, jarSize);
  // recipeRulesSchema admits tomato acidification only for jar sizes with a published amount.
  if (acid === null) throw new Error(`Unreachable: no published acid amount for ${row}`);

  const altitudeFt = altitudeInFeet(altitude);
  const common = {
    recipeName: name,
    tested: recipe.tested,
    productClass: recipe.productClass,
    jarSize,
    pack,
    altitudeFt,
    headspace: headspaceOf(recipe.headspaceInches),
    acidPerJar: acid,
    jarsPerLoad,
    cautionIds: cautionsFor({ method, productClass: recipe.productClass, gauge: canner.gauge }),
  };

  if (method === 'boiling-water' && recipe.processing.boilingWater !== undefined) {
    const lookup = boilingWaterMinutes(recipe.processing.boilingWater, jarSize, pack, altitude);
    if (!lookup.ok) return refuse(lookup.reason.code, `${name}: ${lookup.reason.message}.`);
    const plan: ProcessPlan = {
      ...common,
      method,
      band: lookup.band,
      minutes: lookup.minutes,
      pressure: null,
      ventMinutes: null,
      water: { overJarsInches: WATER_OVER_JARS_INCHES, preheatF: PREHEAT_WATER_F[pack] },
      timing: boilingWaterTiming(lookup.minutes),
      afterProcess: boilingWaterAfter(),
      jarPreparation: jarPreparation(method, lookup.minutes, altitude),
    };
    return { ok: true, plan };
  }

  const minutes = recipe.processing.pressure?.rows.find((r) => r.jarSize === jarSize && r.pack === pack)?.minutes;
  const gauge = canner.gauge;
  if (minutes === undefined || gauge === null) throw new Error('Unreachable: pressure table and gauge checked above');
  const pressure = gaugePressure(gauge, altitude);
  if (!pressure.ok) return refuse(pressure.reason.code, `${name}: ${pressure.reason.message}`);
  const plan: ProcessPlan = {
    ...common,
    method,
    band: pressure.band,
    minutes,
    pressure: { pounds: pressure.pounds, gauge },
    ventMinutes: VENT_MINUTES,
    water: null,
    timing: pressureTiming(minutes, pressure.pounds, gauge === 'dial'),
    afterProcess: pressureAfter(),
    jarPreparation: jarPreparation(method, minutes, altitude),
  };
  return { ok: true, plan };
}
