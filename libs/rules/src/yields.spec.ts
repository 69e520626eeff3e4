import { describe, expect, it } from 'vitest';
import { recipeRulesSchema } from './recipe.js';
import { tomatoesInWater, tomatoSalsa } from './testing/published-recipes.js';
import { cannerLoads, jarsFromBatches, jarsFromProduce } from './yields.js';

const tomatoes = recipeRulesSchema.parse(tomatoesInWater);
const salsa = recipeRulesSchema.parse(tomatoSalsa);

// Whole tomatoes: about 21 lb for 7 quarts, 13 lb for 9 pints, about 3 lb per quart (USDA Guide 3, confirmed).
describe('jarsFromProduce', () => {
  it('21 lb of tomatoes fills 7 quarts exactly', () => {
    expect(jarsFromProduce(tomatoes, 'quart', { value: 21, unit: 'lb' })).toEqual({
      ok: true,
      count: { jarSize: 'quart', exactJars: 7, fullJars: 7, jarsToPrepare: 7, partialJar: 0, leftoverProduce: null },
    });
  });

  it('13 lb of tomatoes fills 9 pints exactly', () => {
    expect(jarsFromProduce(tomatoes, 'pint', { value: 13, unit: 'lb' })).toMatchObject({
      ok: true,
      count: { fullJars: 9, jarsToPrepare: 9, partialJar: 0 },
    });
  });

  it('3 lb is about one quart', () => {
    expect(jarsFromProduce(tomatoes, 'quart', { value: 3, unit: 'lb' })).toMatchObject({ count: { exactJars: 1 } });
  });

  it('rounds up to a jar for the remainder and reports what is left: 22 lb is 7 quarts and 1 lb over', () => {
    const result = jarsFromProduce(tomatoes, 'quart', { value: 22, unit: 'lb' });
    if (!result.ok) throw new Error(result.reason.message);
    expect(result.count.fullJars).toBe(7);
    expect(result.count.jarsToPrepare).toBe(8);
    expect(result.count.partialJar).toBeCloseTo(1 / 3, 9);
    expect(result.count.leftoverProduce?.unit).toBe('lb');
    expect(result.count.leftoverProduce).toEqual({ value: 1, unit: 'lb' });
  });

  it('accepts produce weighed in kilograms (1 lb = 0.45359237 kg, NIST Handbook 44)', () => {
    // 21 lb = 9.52543977 kg.
    const result = jarsFromProduce(tomatoes, 'quart', { value: 9.52543977, unit: 'kg' });
    expect(result).toMatchObject({ ok: true, count: { fullJars: 7, jarsToPrepare: 7 } });
    const over = jarsFromProduce(tomatoes, 'quart', { value: 10, unit: 'kg' });
    if (!over.ok) throw new Error(over.reason.message);
    // 10 kg = 22.0462 lb = 7.3487 quarts; 7 quarts take 21 lb, leaving 1.0462 lb = 0.4746 kg.
    expect(over.count.jarsToPrepare).toBe(8);
    expect(over.count.leftoverProduce?.unit).toBe('kg');
    expect(over.count.leftoverProduce?.value).toBeCloseTo(0.4746, 4);
  });

  it('refuses a jar size the recipe gives no yield for, and bad weights', () => {
    expect(jarsFromProduce(tomatoes, 'half-pint', { value: 5, unit: 'lb' })).toEqual({
      ok: false,
      reason: { code: 'no-yield', message: 'Whole tomatoes in water gives no produce yield for half-pint jars' },
    });
    expect(jarsFromProduce(tomatoes, 'quart', { value: -1, unit: 'lb' })).toEqual({
      ok: false,
      reason: { code: 'invalid-input', message: 'An amount must be more than 0' },
    });
  });
});

describe('jarsFromBatches', () => {
  it('multiplies the batch yield (6 pints a batch is an invented yield)', () => {
    expect(jarsFromBatches(salsa, 'pint', 2)).toMatchObject({ ok: true, count: { fullJars: 12, jarsToPrepare: 12 } });
    expect(jarsFromBatches(salsa, 'pint', 1.25)).toMatchObject({
      ok: true,
      count: { exactJars: 7.5, fullJars: 7, jarsToPrepare: 8, partialJar: 0.5, leftoverProduce: null },
    });
  });

  it('refuses a jar size with no batch yield and a non-positive batch count', () => {
    expect(jarsFromBatches(salsa, 'quart', 1)).toMatchObject({ ok: false, reason: { code: 'no-yield' } });
    expect(jarsFromBatches(salsa, 'pint', 0)).toEqual({
      ok: false,
      reason: { code: 'invalid-input', message: 'Make at least part of a batch' },
    });
  });
});

// A standard boiling-water canner holds 7 quart jars or 8-9 pints (USDA Guide 1, confirmed).
describe('cannerLoads', () => {
  const standard = { quart: 7, pint: 9 };

  it('7 quarts are one full load of a standard canner', () => {
    expect(cannerLoads(standard, 'quart', 7)).toEqual({
      ok: true,
      jarSize: 'quart',
      perLoad: 7,
      loads: 1,
      jarsPerLoad: [7],
    });
  });

  it('9 pints are one load of a 9-pint canner and two of an 8-pint one', () => {
    expect(cannerLoads(standard, 'pint', 9)).toMatchObject({ loads: 1, jarsPerLoad: [9] });
    expect(cannerLoads({ pint: 8 }, 'pint', 9)).toMatchObject({ loads: 2, jarsPerLoad: [8, 1] });
  });

  it('fills loads in turn', () => {
    expect(cannerLoads(standard, 'quart', 16)).toMatchObject({ loads: 3, jarsPerLoad: [7, 7, 2] });
    expect(cannerLoads(standard, 'quart', 0)).toMatchObject({ loads: 0, jarsPerLoad: [] });
  });

  it('refuses a jar size the canner does not hold, and bad counts', () => {
    expect(cannerLoads(standard, 'half-pint', 4)).toEqual({
      ok: false,
      reason: { code: 'canner-jar-size', message: 'This canner is not set up to hold half-pint jars' },
    });
    expect(cannerLoads(standard, 'quart', 2.5)).toEqual({
      ok: false,
      reason: { code: 'invalid-input', message: 'Whole jars only' },
    });
  });
});
