import { describe, expect, it } from 'vitest';
import {
  altitudeInFeet,
  altitudeInMetres,
  bandBoundsSchema,
  bandLabel,
  feetToMetres,
  findBand,
  formatFeet,
  metresToFeet,
} from './altitude.js';
import { ft, m } from './testing/published-recipes.js';

const FOUR_BANDS = [1000, 3000, 6000, null]; // USDA Guide 3 tomato tables
const THREE_BANDS = [1000, 6000, null]; // salsa, jams, pickles

describe('feet and metres', () => {
  it('uses the exact international foot, 0.3048 m (NIST Handbook 44, Appendix C)', () => {
    expect(feetToMetres(1)).toBe(0.3048);
    expect(feetToMetres(1000)).toBe(304.8);
    expect(metresToFeet(0.3048)).toBe(1);
    expect(altitudeInMetres(ft(5000))).toBeCloseTo(1524, 9);
    expect(altitudeInMetres(m(812))).toBe(812);
  });

  it('gives the same feet whichever unit was used', () => {
    expect(altitudeInFeet(m(304.8))).toBe(1000);
    expect(altitudeInFeet(m(914.4))).toBe(3000);
    expect(altitudeInFeet(m(1828.8))).toBe(6000);
    expect(altitudeInFeet(m(3048))).toBe(10000);
    expect(altitudeInFeet(ft(1234.5))).toBe(1234.5);
  });

  it('never rounds metres down to a whole foot: 305 m is 1,000.66 ft', () => {
    expect(altitudeInFeet(m(305))).toBeCloseTo(1000.656168, 6);
    expect(altitudeInFeet(m(305))).toBeGreaterThan(1000);
  });

  it('treats -0 as 0', () => {
    expect(Object.is(altitudeInFeet(m(-0)), 0)).toBe(true);
  });
});

describe('findBand: inclusive upper bounds (USDA Guide 1: sea-level times hold up to 1,000 ft)', () => {
  it.each([
    [0, 0],
    [-200, 0],
    [1000, 0],
    [1000.5, 1],
    [1001, 1],
    [3000, 1],
    [3001, 2],
    [6000, 2],
    [6001, 3],
    [14000, 3],
  ])('four-band table: %d ft is band %d', (feet, index) => {
    expect(findBand(FOUR_BANDS, ft(feet))?.index).toBe(index);
  });

  it.each([
    [1000, 0],
    [1001, 1],
    [6000, 1],
    [6001, 2],
  ])('three-band table: %d ft is band %d', (feet, index) => {
    expect(findBand(THREE_BANDS, ft(feet))?.index).toBe(index);
  });

  it.each([
    [304.8, 0], // exactly 1,000 ft
    [305, 1], // 1,000.66 ft
    [914.4, 1], // exactly 3,000 ft
    [914.5, 2],
    [1828.8, 2], // exactly 6,000 ft
    [1829, 3],
  ])('metric input: %d m is band %d of the four-band table', (metres, index) => {
    expect(findBand(FOUR_BANDS, m(metres))?.index).toBe(index);
  });

  it('labels bands as the tables print them', () => {
    expect(findBand(FOUR_BANDS, ft(0))).toEqual({ index: 0, fromFt: 0, toFt: 1000, label: '0–1,000 ft' });
    expect(findBand(FOUR_BANDS, ft(2000))).toEqual({ index: 1, fromFt: 1001, toFt: 3000, label: '1,001–3,000 ft' });
    expect(findBand(FOUR_BANDS, ft(5000))?.label).toBe('3,001–6,000 ft');
    expect(findBand(FOUR_BANDS, ft(7000))).toEqual({ index: 3, fromFt: 6001, toFt: null, label: 'Above 6,000 ft' });
    expect(findBand(THREE_BANDS, ft(1001))?.label).toBe('1,001–6,000 ft');
    expect(bandLabel([null], 0)).toBe('All altitudes');
    expect(() => bandLabel(THREE_BANDS, 3)).toThrow(RangeError);
  });

  it('finds no band above a table that ends in a number', () => {
    expect(findBand([1000, 8000], ft(8000))?.index).toBe(1);
    expect(findBand([1000, 8000], ft(8001))).toBeNull();
  });
});

describe('formatFeet', () => {
  it('groups thousands without locale data', () => {
    expect(formatFeet(0)).toBe('0');
    expect(formatFeet(999)).toBe('999');
    expect(formatFeet(1000)).toBe('1,000');
    expect(formatFeet(10000)).toBe('10,000');
    expect(formatFeet(-1500)).toBe('-1,500');
  });
});

describe('bandBoundsSchema', () => {
  const messages = (value: unknown) => {
    const result = bandBoundsSchema.safeParse(value);
    return result.success ? [] : result.error.issues.map((i) => i.message);
  };

  it('accepts the published band lists', () => {
    expect(messages(FOUR_BANDS)).toEqual([]);
    expect(messages(THREE_BANDS)).toEqual([]);
    expect(messages([1000, 8000])).toEqual([]);
  });

  it('refuses bounds that do not strictly increase', () => {
    expect(messages([1000, 1000, null])).toEqual(['Band bounds must strictly increase: 1,000 ft follows 1,000 ft']);
    expect(messages([3000, 1000, null])).toEqual(['Band bounds must strictly increase: 1,000 ft follows 3,000 ft']);
  });

  it('refuses an open band anywhere but last', () => {
    expect(messages([1000, null, 6000])).toEqual(['Only the last band may be open-ended (null)']);
  });

  it('refuses an empty list, fractions and non-positive bounds', () => {
    expect(messages([])).toEqual(['Give at least one altitude band']);
    expect(messages([1000.5, null])).toEqual(['Band bounds are whole feet']);
    expect(messages([0, null])).toEqual(['Band bounds must be above 0 ft']);
    expect(messages(['1000'])).toEqual(['A band bound must be a number of feet or null']);
  });
});
