import { describe, expect, it } from 'vitest';
import { formatAmount } from './amount-display.js';
import type { Amount } from './units.js';

const text = (amount: Amount, system: 'us' | 'metric') => formatAmount(amount, system).text;

describe('formatAmount, metric', () => {
  // Expected values: the NIST Handbook 44 exact sizes, rounded as a kitchen would measure them.
  it.each([
    [{ value: 2, unit: 'tbsp' }, '30 mL'], // 29.57 mL
    [{ value: 1, unit: 'tbsp' }, '15 mL'], // 14.79 mL
    [{ value: 1, unit: 'tsp' }, '5 mL'], // 4.93 mL
    [{ value: 0.5, unit: 'tsp' }, '2.5 mL'], // 2.46 mL
    [{ value: 0.25, unit: 'tsp' }, '1.25 mL'], // 1.23 mL
    [{ value: 0.25, unit: 'cup' }, '60 mL'], // 59.1 mL
    [{ value: 1, unit: 'cup' }, '235 mL'], // 236.6 mL
    [{ value: 1, unit: 'pint' }, '470 mL'], // 473.2 mL
    [{ value: 1, unit: 'quart' }, '950 mL'], // 946.4 mL
    [{ value: 1, unit: 'gallon' }, '3.8 L'], // 3.785 L
    [{ value: 1, unit: 'lb' }, '454 g'], // 453.59 g
    [{ value: 1, unit: 'oz' }, '28 g'], // 28.35 g
    [{ value: 21, unit: 'lb' }, '9.53 kg'], // 9.525 kg
    [{ value: 0.25, unit: 'oz' }, '7 g'], // 7.09 g
  ] as [Amount, string][])('%o -> %s', (amount, expected) => {
    expect(text(amount, 'metric')).toBe(expected);
  });

  it('returns the rounded value and unit as well as the text', () => {
    expect(formatAmount({ value: 2, unit: 'tbsp' }, 'metric')).toEqual({ value: 30, unit: 'mL', text: '30 mL' });
    expect(formatAmount({ value: 21, unit: 'lb' }, 'metric')).toEqual({ value: 9.53, unit: 'kg', text: '9.53 kg' });
  });
});

describe('formatAmount, US', () => {
  it.each([
    [{ value: 30, unit: 'mL' }, '2 Tbsp'], // 2.03 Tbsp
    [{ value: 15, unit: 'mL' }, '1 Tbsp'],
    [{ value: 2.5, unit: 'mL' }, '1/2 tsp'], // 0.51 tsp
    [{ value: 1.25, unit: 'mL' }, '1/4 tsp'],
    [{ value: 14.5, unit: 'mL' }, '1 Tbsp'], // 2.94 tsp rounds to 3 tsp, which is shown as 1 Tbsp
    [{ value: 1 / 3, unit: 'cup' }, '1/3 cup'],
    [{ value: 1.25, unit: 'cup' }, '1 1/4 cups'],
    [{ value: 250, unit: 'mL' }, '1 cup'], // 1.057 cups
    [{ value: 1, unit: 'L' }, '1 quart'], // 1.057 quarts
    [{ value: 10, unit: 'quart' }, '2 1/2 gallons'],
    [{ value: 454, unit: 'g' }, '1 lb'],
    [{ value: 1, unit: 'kg' }, '2 1/4 lb'], // 2.205 lb
    [{ value: 100, unit: 'g' }, '3 1/2 oz'], // 3.53 oz
  ] as [Amount, string][])('%o -> %s', (amount, expected) => {
    expect(text(amount, 'us')).toBe(expected);
  });

  it('says "less than" the finest step rather than print 0', () => {
    expect(text({ value: 0.1, unit: 'mL' }, 'us')).toBe('less than 1/8 tsp');
    expect(text({ value: 0.1, unit: 'mL' }, 'metric')).toBe('less than 0.25 mL');
    expect(text({ value: 0.1, unit: 'g' }, 'metric')).toBe('less than 0.5 g');
  });
});
