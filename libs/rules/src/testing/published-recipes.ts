/**
 * Recipe inputs for tests, built from the published tables (USDA Complete Guide to Home Canning, 1994 and 2015
 * revisions; NCHFP). Only the process times, headspaces and yields are published values; recipe names are ours.
 * Not part of the library: excluded from the build and never exported.
 */
import type { CannerRules } from '../plan.js';
import type { RecipeRulesInput } from '../recipe.js';

/** USDA Guide 3, whole or halved tomatoes packed in water, hot or raw (confirmed, 1994 copy; 2015 table quoted). */
export const tomatoesInWater: RecipeRulesInput = {
  name: 'Whole tomatoes in water',
  productClass: 'acid',
  acidification: 'tomato',
  headspaceInches: 0.5, // USDA Guide 1: fruits and tomatoes, 1/2 in (confirmed)
  tested: true,
  processing: {
    boilingWater: {
      bands: [1000, 3000, 6000, null],
      rows: [
        { jarSize: 'pint', pack: 'hot', minutes: [40, 45, 50, 55] },
        { jarSize: 'pint', pack: 'raw', minutes: [40, 45, 50, 55] },
        { jarSize: 'quart', pack: 'hot', minutes: [45, 50, 55, 60] },
        { jarSize: 'quart', pack: 'raw', minutes: [45, 50, 55, 60] },
      ],
    },
  },
  // USDA Guide 3: about 21 lb for 7 quarts, 13 lb for 9 pints (confirmed).
  produceYields: [
    { jarSize: 'quart', jars: 7, produce: { value: 21, unit: 'lb' } },
    { jarSize: 'pint', jars: 9, produce: { value: 13, unit: 'lb' } },
  ],
};

/** USDA Guide 3, tomatoes packed raw without added liquid, pint or quart (confirmed, secondary copy). */
export const tomatoesRawNoLiquid: RecipeRulesInput = {
  name: 'Raw-packed tomatoes without liquid',
  productClass: 'acid',
  acidification: 'tomato',
  headspaceInches: 0.5,
  tested: true,
  processing: {
    boilingWater: {
      bands: [1000, 3000, 6000, null],
      rows: [
        { jarSize: 'pint', pack: 'raw', minutes: [85, 90, 95, 100] },
        { jarSize: 'quart', pack: 'raw', minutes: [85, 90, 95, 100] },
      ],
    },
  },
};

/** NCHFP tomato / tomato-paste salsa, pints (confirmed, secondary copy); salsas take 1/2 in headspace. */
export const tomatoSalsa: RecipeRulesInput = {
  name: 'Tomato salsa',
  productClass: 'acidified',
  headspaceInches: 0.5,
  tested: true,
  processing: {
    boilingWater: { bands: [1000, 6000, null], rows: [{ jarSize: 'pint', pack: 'hot', minutes: [15, 20, 25] }] },
  },
  batchYields: [{ jarSize: 'pint', jars: 6 }], // invented batch size, for yield arithmetic only
};

/** USDA Guide 7, hot-packed jams, half-pint or pint (confirmed, secondary copy); jams take 1/4 in headspace. */
export const hotPackJam: RecipeRulesInput = {
  name: 'Berry jam',
  productClass: 'acid',
  headspaceInches: 0.25,
  tested: true,
  processing: {
    boilingWater: {
      bands: [1000, 6000, null],
      rows: [
        { jarSize: 'half-pint', pack: 'hot', minutes: [5, 10, 15] },
        { jarSize: 'pint', pack: 'hot', minutes: [5, 10, 15] },
      ],
    },
  },
};

/** USDA Guide 6, quick fresh-pack dill pickles (confirmed); pickles take 1/2 in headspace. */
export const dillPickles: RecipeRulesInput = {
  name: 'Quick dill pickles',
  productClass: 'acidified',
  headspaceInches: 0.5,
  tested: true,
  processing: {
    boilingWater: {
      bands: [1000, 6000, null],
      rows: [
        { jarSize: 'pint', pack: 'raw', minutes: [10, 15, 20] },
        { jarSize: 'quart', pack: 'raw', minutes: [15, 20, 25] },
      ],
    },
  },
};

/**
 * A low-acid pressure recipe for testing the pressure RULES only. references.md publishes no pressure process
 * time, so the minutes (33 and 37) are arbitrary test inputs, not a time to can by. Headspace 1 in is the
 * published value for low-acid vegetables such as green beans (USDA Guide 1, confirmed).
 */
export const pressureRulesOnly: RecipeRulesInput = {
  name: 'Pressure test vegetable',
  productClass: 'low-acid',
  headspaceInches: 1,
  tested: true,
  processing: {
    pressure: {
      rows: [
        { jarSize: 'pint', pack: 'hot', minutes: 33 },
        { jarSize: 'quart', pack: 'hot', minutes: 37 },
      ],
    },
  },
};

/** A standard boiling-water canner holds 7 quart jars or 8-9 pints (USDA Guide 1, confirmed); half-pints invented. */
export const boilingWaterCanner: CannerRules = {
  method: 'boiling-water',
  gauge: null,
  capacity: { quart: 7, pint: 9, 'half-pint': 12 },
};

/** Invented capacities for pressure canners. */
export const weightedCanner: CannerRules = { method: 'pressure', gauge: 'weighted', capacity: { quart: 7, pint: 9 } };
export const dialCanner: CannerRules = { method: 'pressure', gauge: 'dial', capacity: { quart: 7, pint: 9 } };

export const ft = (value: number) => ({ value, unit: 'ft' as const });
export const m = (value: number) => ({ value, unit: 'm' as const });
