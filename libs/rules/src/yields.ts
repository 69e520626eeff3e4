import { z } from 'zod';
import { JAR_SIZE_LABELS, jarSizeSchema, type JarSize } from './jars.js';
import type { RecipeRules } from './recipe.js';
import { convertValue, massAmountSchema, type MassAmount } from './units.js';

/** How many jars a quantity of produce or a number of batches fills. */
export interface JarCount {
  jarSize: JarSize;
  /** The estimate before rounding, e.g. 7.33 quarts. */
  exactJars: number;
  /** Jars that will be full. */
  fullJars: number;
  /**
   * Jars to have ready: one more than the full ones whenever something is left over, because published yields
   * are approximate ("about 3 lb per quart"). A part-filled jar is not processed: refrigerate it and use it soon.
   */
  jarsToPrepare: number;
  /** How full the last, part-filled jar would be (0 when the jars come out even), e.g. 0.33. */
  partialJar: number;
  /** Produce left over after the full jars, in the unit the produce was given in (null for batches). */
  leftoverProduce: MassAmount | null;
}

export type YieldResult =
  { ok: true; count: JarCount } | { ok: false; reason: { code: 'invalid-input' | 'no-yield'; message: string } };

/** Counts are snapped to a billionth of a jar so that 13 lb at 13 lb per 9 pints is exactly 9, not 8.999999. */
const snap = (jars: number) => Math.round(jars * 1e9) / 1e9;

function count(jarSize: JarSize, exactJars: number, leftover: (fullJars: number) => MassAmount | null): JarCount {
  const exact = snap(exactJars);
  const fullJars = Math.floor(exact);
  const partialJar = snap(exact - fullJars);
  return {
    jarSize,
    exactJars: exact,
    fullJars,
    jarsToPrepare: Math.ceil(exact),
    partialJar,
    leftoverProduce: partialJar === 0 ? null : leftover(fullJars),
  };
}

const invalid = (error: z.ZodError): YieldResult => ({
  ok: false,
  reason: { code: 'invalid-input', message: error.issues.map((i) => i.message).join('; ') },
});
const sizeName = (jarSize: JarSize) => JAR_SIZE_LABELS[jarSize].toLowerCase();

/**
 * Jars of one size that a weight of produce fills, from the recipe's own published yield, e.g. whole tomatoes,
 * about 21 lb for 7 quarts (USDA Complete Guide to Home Canning, Guide 3).
 */
export function jarsFromProduce(
  recipe: Pick<RecipeRules, 'name' | 'produceYields'>,
  jarSize: JarSize,
  produce: MassAmount,
): YieldResult {
  const parsed = z.object({ jarSize: jarSizeSchema, produce: massAmountSchema }).safeParse({ jarSize, produce });
  if (!parsed.success) return invalid(parsed.error);
  const published = recipe.produceYields.find((y) => y.jarSize === jarSize);
  if (published === undefined) {
    return {
      ok: false,
      reason: { code: 'no-yield', message: `${recipe.name} gives no produce yield for ${sizeName(jarSize)} jars` },
    };
  }
  const inPublishedUnit = convertValue(produce.value, produce.unit, published.produce.unit);
  const exact = (inPublishedUnit * published.jars) / published.produce.value;
  // What the full jars take, subtracted in the published unit so 22 lb less 7 x 3 lb is exactly 1 lb.
  const leftover = (fullJars: number): MassAmount => {
    const rest = inPublishedUnit - (fullJars * published.produce.value) / published.jars;
    return { value: convertValue(rest, published.produce.unit, produce.unit), unit: produce.unit };
  };
  return { ok: true, count: count(jarSize, exact, leftover) };
}

/** Jars of one size that a number of batches fills (batches may be fractional, e.g. 1.5). */
export function jarsFromBatches(
  recipe: Pick<RecipeRules, 'name' | 'batchYields'>,
  jarSize: JarSize,
  batches: number,
): YieldResult {
  const parsed = z
    .number({ error: 'Batches must be a number' })
    .finite('Batches must be a finite number')
    .positive('Make at least part of a batch')
    .safeParse(batches);
  if (!parsed.success) return invalid(parsed.error);
  const published = recipe.batchYields.find((y) => y.jarSize === jarSize);
  if (published === undefined) {
    return {
      ok: false,
      reason: { code: 'no-yield', message: `${recipe.name} gives no batch yield for ${sizeName(jarSize)} jars` },
    };
  }
  return { ok: true, count: count(jarSize, parsed.data * published.jars, () => null) };
}

export type LoadPlan =
  | { ok: true; jarSize: JarSize; perLoad: number; loads: number; jarsPerLoad: number[] }
  | { ok: false; reason: { code: 'invalid-input' | 'canner-jar-size'; message: string } };

/**
 * Canner loads for a number of jars of one size, from the canner's capacity for that size (a standard
 * boiling-water canner holds 7 quarts or 8-9 pints, USDA Guide 1). Loads are filled in turn, as jars come off
 * the filling station: 9 quarts in a 7-quart canner are a load of 7, then a load of 2.
 */
export function cannerLoads(capacity: Partial<Record<JarSize, number>>, jarSize: JarSize, jars: number): LoadPlan {
  const parsed = z
    .number({ error: 'Jars must be a number' })
    .int('Whole jars only')
    .nonnegative('Jars cannot be negative')
    .safeParse(jars);
  if (!parsed.success)
    return { ok: false, reason: { code: 'invalid-input', message: parsed.error.issues[0]?.message ?? '' } };
  const perLoad = capacity[jarSize] ?? 0;
  if (!Number.isInteger(perLoad) || perLoad < 1) {
    return {
      ok: false,
      reason: { code: 'canner-jar-size', message: `This canner is not set up to hold ${sizeName(jarSize)} jars` },
    };
  }
  const loads = Math.ceil(parsed.data / perLoad);
  const jarsPerLoad = Array.from({ length: loads }, (_, i) => Math.min(perLoad, parsed.data - i * perLoad));
  return { ok: true, jarSize, perLoad, loads, jarsPerLoad };
}
