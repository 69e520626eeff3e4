import { describe, expect, it } from 'vitest';
import { acidPerJar, headspaceOf, jarPreparation, sterilisingMinutes } from './jar-prep.js';
import { ft, m } from './testing/published-recipes.js';

describe('sterilisingMinutes (USDA Guide 1: 10 min at or below 1,000 ft, +1 min per additional 1,000 ft)', () => {
  it.each([
    [-100, 10],
    [0, 10],
    [1000, 10],
    [1001, 11],
    [2000, 11],
    [2001, 12],
    [3500, 13],
    [6000, 15],
    [8000, 17],
    [10000, 19],
  ])('%d ft: %d min', (feet, minutes) => {
    expect(sterilisingMinutes(ft(feet))).toBe(minutes);
  });

  it('reads metric altitudes the same way', () => {
    expect(sterilisingMinutes(m(304.8))).toBe(10);
    expect(sterilisingMinutes(m(305))).toBe(11);
  });
});

describe('jarPreparation (USDA Guide 1)', () => {
  it('sterilises only for boiling-water processes under 10 minutes', () => {
    expect(jarPreparation('boiling-water', 5, ft(2500))).toEqual({
      sterilise: true,
      minutes: 12,
      text: 'Sterilise the jars: boil them 12 minutes, then keep them in the hot water until you fill them.',
    });
    expect(jarPreparation('boiling-water', 9, ft(0))).toMatchObject({ sterilise: true, minutes: 10 });
  });

  it('keeps jars hot at about 180 °F for 10 minutes or more, and always for pressure canning', () => {
    const keepHot = {
      sterilise: false,
      keepHotF: 180,
      text: 'Wash the jars and keep them hot in simmering water (about 180 °F) until you fill them.',
    };
    expect(jarPreparation('boiling-water', 10, ft(0))).toEqual(keepHot);
    expect(jarPreparation('pressure', 5, ft(0))).toEqual(keepHot);
  });
});

describe('headspaceOf (USDA Guide 1 headspaces)', () => {
  it.each([
    [0.25, 6.35, '1/4 in (6 mm)'], // jams and jellies (confirmed)
    [0.5, 12.7, '1/2 in (13 mm)'], // fruits, tomatoes, salsas, pickles (confirmed); relishes (from memory)
    [1, 25.4, '1 in (25 mm)'], // low-acid vegetables such as green beans (confirmed)
    [1.25, 31.75, '1 1/4 in (32 mm)'], // poultry, hot or raw pack (confirmed)
  ])('%d in = %d mm', (inches, mm, label) => {
    const h = headspaceOf(inches);
    expect(h.mm).toBeCloseTo(mm, 12); // 1 in = 25.4 mm exactly (NIST Handbook 44, Appendix C)
    expect(h.label).toBe(label);
  });

  it('prints eighths in lowest terms', () => {
    expect(headspaceOf(0.125).label).toBe('1/8 in (3 mm)');
    expect(headspaceOf(0.75).label).toBe('3/4 in (19 mm)');
    expect(headspaceOf(1.375).label).toBe('1 3/8 in (35 mm)');
  });
});

describe('acidPerJar (USDA Guide 3)', () => {
  it('per quart: 2 Tbsp bottled lemon juice or 1/2 tsp citric acid', () => {
    expect(acidPerJar('tomato', 'quart')?.map((a) => a.amount)).toEqual([
      { value: 2, unit: 'tbsp' },
      { value: 0.5, unit: 'tsp' },
    ]);
  });

  it('per pint: 1 Tbsp bottled lemon juice or 1/4 tsp citric acid', () => {
    const options = acidPerJar('tomato', 'pint');
    expect(options?.map((a) => a.amount)).toEqual([
      { value: 1, unit: 'tbsp' },
      { value: 0.25, unit: 'tsp' },
    ]);
    expect(options?.map((a) => [a.us.text, a.metric.text])).toEqual([
      ['1 Tbsp', '15 mL'],
      ['1/4 tsp', '1.25 mL'],
    ]);
  });

  it('is empty when the recipe adds no acid, and null for a jar size with no published amount', () => {
    expect(acidPerJar(null, 'half-pint')).toEqual([]);
    expect(acidPerJar('tomato', 'half-pint')).toBeNull();
  });
});
