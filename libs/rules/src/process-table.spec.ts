import { describe, expect, it } from 'vitest';
import {
  boilingWaterMinutes,
  boilingWaterTableSchema,
  pressureTableSchema,
  processingSchema,
  type BoilingWaterTable,
} from './process-table.js';
import {
  dillPickles,
  ft,
  hotPackJam,
  m,
  tomatoesInWater,
  tomatoesRawNoLiquid,
  tomatoSalsa,
} from './testing/published-recipes.js';
import type { RecipeRulesInput } from './recipe.js';

const tableOf = (recipe: RecipeRulesInput): BoilingWaterTable =>
  boilingWaterTableSchema.parse(recipe.processing.boilingWater);

const messages = (
  schema: { safeParse(v: unknown): { success: boolean; error?: { issues: { message: string }[] } } },
  value: unknown,
) => {
  const result = schema.safeParse(value);
  return result.success ? [] : (result.error?.issues.map((i) => i.message) ?? []);
};

describe('published boiling-water tables, read at each band and its edges', () => {
  // Altitudes at both edges of every band of a four-band table (0-1,000 / 1,001-3,000 / 3,001-6,000 / above 6,000).
  const fourBandProbes = [0, 1000, 1001, 3000, 3001, 6000, 6001, 10000];
  const fourBandIndex = [0, 0, 1, 1, 2, 2, 3, 3];

  it('whole or halved tomatoes in water, pints: 40/45/50/55 min (USDA Guide 3; confirmed, 1994 copy, 2015 table quoted)', () => {
    const expected = [40, 45, 50, 55];
    for (const pack of ['hot', 'raw'] as const) {
      fourBandProbes.forEach((feet, i) => {
        expect(boilingWaterMinutes(tableOf(tomatoesInWater), 'pint', pack, ft(feet))).toMatchObject({
          ok: true,
          minutes: expected[fourBandIndex[i]!],
        });
      });
    }
  });

  it('whole or halved tomatoes in water, quarts: 45/50/55/60 min (USDA Guide 3; confirmed)', () => {
    const expected = [45, 50, 55, 60];
    fourBandProbes.forEach((feet, i) => {
      expect(boilingWaterMinutes(tableOf(tomatoesInWater), 'quart', 'hot', ft(feet))).toMatchObject({
        minutes: expected[fourBandIndex[i]!],
      });
    });
  });

  it('tomatoes raw-packed without liquid, pints and quarts: 85/90/95/100 min (USDA Guide 3; confirmed, secondary copy)', () => {
    const expected = [85, 90, 95, 100];
    for (const jar of ['pint', 'quart'] as const) {
      fourBandProbes.forEach((feet, i) => {
        expect(boilingWaterMinutes(tableOf(tomatoesRawNoLiquid), jar, 'raw', ft(feet))).toMatchObject({
          minutes: expected[fourBandIndex[i]!],
        });
      });
    }
  });

  // Three-band tables: 0-1,000 / 1,001-6,000 / above 6,000 ft.
  const threeBandProbes = [0, 1000, 1001, 6000, 6001, 9000];
  const threeBandIndex = [0, 0, 1, 1, 2, 2];
  it.each([
    ['tomato salsa, pints (NCHFP; confirmed, secondary copy)', tomatoSalsa, 'pint', 'hot', [15, 20, 25]],
    [
      'hot-packed jam, half-pints (USDA Guide 7; confirmed, secondary copy)',
      hotPackJam,
      'half-pint',
      'hot',
      [5, 10, 15],
    ],
    ['hot-packed jam, pints (USDA Guide 7; confirmed, secondary copy)', hotPackJam, 'pint', 'hot', [5, 10, 15]],
    ['quick dill pickles, pints (USDA Guide 6; confirmed)', dillPickles, 'pint', 'raw', [10, 15, 20]],
    ['quick dill pickles, quarts (USDA Guide 6; confirmed)', dillPickles, 'quart', 'raw', [15, 20, 25]],
  ] as const)('%s', (_name, recipe, jar, pack, expected) => {
    threeBandProbes.forEach((feet, i) => {
      expect(boilingWaterMinutes(tableOf(recipe), jar, pack, ft(feet))).toMatchObject({
        minutes: expected[threeBandIndex[i]!],
      });
    });
  });

  it('reads metric altitudes through the same inclusive bounds: 304.8 m = 1,000 ft, 305 m is above', () => {
    expect(boilingWaterMinutes(tableOf(tomatoesInWater), 'quart', 'hot', m(304.8))).toMatchObject({ minutes: 45 });
    expect(boilingWaterMinutes(tableOf(tomatoesInWater), 'quart', 'hot', m(305))).toMatchObject({ minutes: 50 });
    expect(boilingWaterMinutes(tableOf(dillPickles), 'pint', 'raw', m(1829))).toMatchObject({ minutes: 20 });
  });

  it('returns the band used with its label', () => {
    expect(boilingWaterMinutes(tableOf(tomatoSalsa), 'pint', 'hot', ft(2500))).toEqual({
      ok: true,
      minutes: 20,
      band: { index: 1, fromFt: 1001, toFt: 6000, label: '1,001–6,000 ft' },
    });
  });

  it('refuses a jar or pack the table does not list, and altitudes above a closed table', () => {
    expect(boilingWaterMinutes(tableOf(tomatoesRawNoLiquid), 'pint', 'hot', ft(0))).toEqual({
      ok: false,
      reason: { code: 'no-tested-time', message: 'No tested time for pint jars, hot pack' },
    });
    const closed = boilingWaterTableSchema.parse({
      bands: [1000, 8000],
      rows: [{ jarSize: 'pint', pack: 'hot', minutes: [10, 15] }],
    });
    expect(boilingWaterMinutes(closed, 'pint', 'hot', ft(8000))).toMatchObject({ ok: true, minutes: 15 });
    expect(boilingWaterMinutes(closed, 'pint', 'hot', ft(8001))).toEqual({
      ok: false,
      reason: {
        code: 'altitude-beyond-table',
        message: "This recipe's table stops at 1,001–8,000 ft; there is no tested time above 8,000 ft",
      },
    });
  });
});

describe('boilingWaterTableSchema messages', () => {
  const row = (minutes: unknown, jarSize = 'pint', pack = 'hot') => ({ jarSize, pack, minutes });

  it('accepts every published table', () => {
    for (const recipe of [tomatoesInWater, tomatoesRawNoLiquid, tomatoSalsa, hotPackJam, dillPickles]) {
      expect(messages(boilingWaterTableSchema, recipe.processing.boilingWater)).toEqual([]);
    }
  });

  it('needs strictly increasing bands', () => {
    expect(messages(boilingWaterTableSchema, { bands: [1000, 900, null], rows: [row([5, 10, 15])] })).toEqual([
      'Band bounds must strictly increase: 900 ft follows 1,000 ft',
    ]);
  });

  it('needs one minute value per band in every row', () => {
    expect(messages(boilingWaterTableSchema, { bands: [1000, 6000, null], rows: [row([5, 10])] })).toEqual([
      'pint jars, hot pack has 2 times for 3 altitude bands; give one per band',
    ]);
  });

  it('needs positive whole minutes', () => {
    expect(messages(boilingWaterTableSchema, { bands: [1000, null], rows: [row([5.5, 10])] })).toEqual([
      'Process times are whole minutes',
    ]);
    expect(messages(boilingWaterTableSchema, { bands: [1000, null], rows: [row([0, 10])] })).toEqual([
      'A process time must be more than 0 minutes',
    ]);
    expect(messages(boilingWaterTableSchema, { bands: [1000, null], rows: [row([-5, 10])] })).toEqual([
      'A process time must be more than 0 minutes',
    ]);
    expect(messages(boilingWaterTableSchema, { bands: [1000, null], rows: [row(['5', 10])] })).toEqual([
      'A process time must be a number of minutes',
    ]);
    expect(messages(boilingWaterTableSchema, { bands: [null], rows: [row([301])] })).toEqual([
      'A process time must be at most 300 minutes',
    ]);
  });

  it('refuses duplicate jar/pack rows', () => {
    const value = { bands: [1000, null], rows: [row([5, 10]), row([5, 10], 'quart'), row([6, 11])] };
    expect(messages(boilingWaterTableSchema, value)).toEqual(['More than one row for pint jars, hot pack']);
  });

  it('refuses times that fall as altitude rises', () => {
    expect(messages(boilingWaterTableSchema, { bands: [1000, 6000, null], rows: [row([10, 15, 12])] })).toEqual([
      'pint jars, hot pack: 12 min at Above 6,000 ft is shorter than 15 min lower down; times never fall as altitude rises',
    ]);
  });

  it('refuses unknown keys, jar sizes and packs', () => {
    expect(messages(boilingWaterTableSchema, { bands: [null], rows: [row([10], 'jug')] })).toEqual([
      'Jar size must be one of: half-pint, pint, pint-and-a-half, quart, half-gallon',
    ]);
    expect(messages(boilingWaterTableSchema, { bands: [null], rows: [row([10], 'pint', 'cold')] })).toEqual([
      'Pack style must be hot or raw',
    ]);
    expect(messages(boilingWaterTableSchema, { bands: [null], rows: [{ ...row([10]), minuets: 3 }] })).toEqual([
      'Unrecognized key: "minuets"',
    ]);
    expect(messages(boilingWaterTableSchema, { bands: [null], rows: [] })).toEqual([
      'Give at least one jar size and pack style',
    ]);
  });
});

describe('pressureTableSchema and processingSchema', () => {
  it('accepts one whole-minute time per jar and pack', () => {
    expect(messages(pressureTableSchema, { rows: [{ jarSize: 'pint', pack: 'hot', minutes: 20 }] })).toEqual([]);
  });

  it('refuses duplicates and bad minutes', () => {
    const dup = {
      rows: [
        { jarSize: 'quart', pack: 'raw', minutes: 20 },
        { jarSize: 'quart', pack: 'raw', minutes: 25 },
      ],
    };
    expect(messages(pressureTableSchema, dup)).toEqual(['More than one row for quart jars, raw pack']);
    expect(messages(pressureTableSchema, { rows: [{ jarSize: 'pint', pack: 'hot', minutes: 0.5 }] })).toEqual([
      'Process times are whole minutes',
    ]);
  });

  it('needs at least one method', () => {
    expect(messages(processingSchema, {})).toEqual(['Give a boiling-water table, a pressure table or both']);
    expect(messages(processingSchema, { oven: {} })).toContain('Unrecognized key: "oven"');
  });
});
