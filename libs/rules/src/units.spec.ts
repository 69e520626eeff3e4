import { describe, expect, it } from 'vitest';
import {
  amountSchema,
  batchScaleFactor,
  convertAmount,
  convertValue,
  inchesToMillimetres,
  scaleAmount,
  toGrams,
  toMillilitres,
  toPounds,
  type MassUnit,
  type VolumeUnit,
} from './units.js';

/**
 * Exact values of NIST Handbook 44, Appendix C (confirmed). js-quantities 1.8 stores its factors with 8 or 9
 * significant figures, and not all of them correctly rounded (its pint is 473.176475 mL against the exact
 * 473.176473 mL, a relative error of 4.2e-9). So we require agreement to 1 part in 10^8: tight enough to catch a
 * wrong unit or a wrong factor, honest about what the library really achieves. Its pound is stored exactly.
 */
const RELATIVE_TOLERANCE = 1e-8;
const expectAgreement = (actual: number, exact: number) => {
  expect(Math.abs(actual - exact) / exact).toBeLessThan(RELATIVE_TOLERANCE);
};

describe('US customary volumes in millilitres (NIST Handbook 44, Appendix C)', () => {
  it.each([
    ['gallon', 3785.411784], // 231 in³
    ['quart', 946.352946],
    ['pint', 473.176473],
    ['cup', 236.5882365],
    ['fl-oz', 29.5735295625],
    ['tbsp', 14.78676478125],
    ['tsp', 4.92892159375],
  ] as [VolumeUnit, number][])('1 %s = %d mL', (unit, exact) => {
    expectAgreement(toMillilitres({ value: 1, unit }), exact);
  });

  it('litres and millilitres are metric by definition', () => {
    expect(toMillilitres({ value: 1, unit: 'L' })).toBe(1000);
    expect(toMillilitres({ value: 250, unit: 'mL' })).toBe(250);
  });
});

describe('masses in grams (NIST Handbook 44, Appendix C)', () => {
  it('1 lb = 453.59237 g exactly', () => {
    expect(toGrams({ value: 1, unit: 'lb' })).toBeCloseTo(453.59237, 9);
  });

  it.each([['oz', 28.349523125]] as [MassUnit, number][])('1 %s = %d g', (unit, exact) => {
    expectAgreement(toGrams({ value: 1, unit }), exact);
  });

  it('kilograms to pounds', () => {
    expectAgreement(toPounds({ value: 1, unit: 'kg' }), 1 / 0.45359237);
  });
});

describe('conversions between US units agree with the exact ratios', () => {
  it('4 quarts to the gallon, 2 cups to the pint, 3 tsp to the Tbsp, 16 oz to the pound', () => {
    expectAgreement(convertValue(1, 'gallon', 'quart'), 4);
    expectAgreement(convertValue(1, 'pint', 'cup'), 2);
    expectAgreement(convertValue(1, 'tbsp', 'tsp'), 3);
    expectAgreement(convertValue(1, 'lb', 'oz'), 16);
  });

  it('keeps the unit it was asked for', () => {
    const cups = convertAmount({ value: 1, unit: 'quart' }, 'cup');
    expect(cups.unit).toBe('cup');
    expectAgreement(cups.value, 4);
  });

  it('refuses to turn a volume into a mass', () => {
    expect(() => convertValue(1, 'cup', 'g')).toThrow('Cannot convert cup to g: one is a volume and the other a mass');
  });

  it('inches to millimetres (1 in = 25.4 mm exactly)', () => {
    expect(inchesToMillimetres(1)).toBe(25.4);
    expect(inchesToMillimetres(0.5)).toBe(12.7);
  });
});

describe('scaling ingredient amounts', () => {
  it('scales in the amount’s own unit', () => {
    expect(scaleAmount({ value: 2, unit: 'tbsp' }, 1.5)).toEqual({ value: 3, unit: 'tbsp' });
    expect(scaleAmount({ value: 500, unit: 'g' }, 3)).toEqual({ value: 1500, unit: 'g' });
    expect(scaleAmount({ value: 0.25, unit: 'cup' }, batchScaleFactor(2, 3))).toEqual({ value: 0.375, unit: 'cup' });
  });

  it('refuses a factor that is not a positive number', () => {
    expect(() => scaleAmount({ value: 1, unit: 'cup' }, 0)).toThrow('The scale factor must be more than 0');
    expect(() => scaleAmount({ value: 1, unit: 'cup' }, Number.NaN)).toThrow(RangeError);
    expect(() => batchScaleFactor(0, 2)).toThrow('The scale factor must be more than 0');
  });
});

describe('amountSchema', () => {
  it('accepts positive amounts with known units and explains the rest', () => {
    expect(amountSchema.safeParse({ value: 2, unit: 'tbsp' }).success).toBe(true);
    expect(amountSchema.safeParse({ value: 500, unit: 'g' }).success).toBe(true);
    expect(amountSchema.safeParse({ value: 2, unit: 'handful' }).error?.issues.map((i) => i.message)).toEqual([
      'An amount is a positive number with a volume or mass unit',
    ]);
    expect(amountSchema.safeParse({ value: -2, unit: 'tbsp' }).error?.issues.map((i) => i.message)).toEqual([
      'An amount must be more than 0',
    ]);
  });
});
