import { describe, expect, it } from 'vitest';
import { classifyProduct, requiresPressureCanning } from './product-class.js';

const classOf = (input: Parameters<typeof classifyProduct>[0]) => {
  const result = classifyProduct(input);
  return result.ok ? result.productClass : result.reason.code;
};

// Definitions of 21 CFR 114.3 (confirmed).
describe('classifyProduct (21 CFR 114.3)', () => {
  it('acid food: natural pH 4.6 or below', () => {
    expect(classOf({ naturalPh: 4.6, acidAdded: false, waterActivity: 0.98 })).toBe('acid');
    expect(classOf({ naturalPh: 3.2, acidAdded: false, waterActivity: 0.99 })).toBe('acid');
    expect(classOf({ naturalPh: 3.2, acidAdded: false, waterActivity: 0.8 })).toBe('acid');
  });

  it('low-acid food: pH above 4.6 and water activity above 0.85', () => {
    expect(classOf({ naturalPh: 4.61, acidAdded: false, waterActivity: 0.86 })).toBe('low-acid');
    expect(classOf({ naturalPh: 6.2, acidAdded: false, waterActivity: 0.99 })).toBe('low-acid');
  });

  it('tomatoes below pH 4.7 are not classed low-acid', () => {
    expect(classOf({ naturalPh: 4.65, acidAdded: false, waterActivity: 0.97, tomato: true })).toBe('acid');
    expect(classOf({ naturalPh: 4.65, acidAdded: false, waterActivity: 0.97 })).toBe('low-acid');
    expect(classOf({ naturalPh: 4.7, acidAdded: false, waterActivity: 0.97, tomato: true })).toBe('low-acid');
    expect(classOf({ naturalPh: 4.9, acidAdded: true, equilibriumPh: 4.65, waterActivity: 0.97, tomato: true })).toBe(
      'acid',
    );
  });

  it('acidified food: a low-acid food with acid added to an equilibrium pH of 4.6 or below, aw above 0.85', () => {
    expect(classOf({ naturalPh: 5.8, acidAdded: true, equilibriumPh: 4.6, waterActivity: 0.95 })).toBe('acidified');
    expect(classOf({ naturalPh: 5.8, acidAdded: true, equilibriumPh: 3.8, waterActivity: 0.86 })).toBe('acidified');
  });

  it('stays low-acid when the added acid does not bring the pH to 4.6', () => {
    expect(classOf({ naturalPh: 5.8, acidAdded: true, equilibriumPh: 4.7, waterActivity: 0.95 })).toBe('low-acid');
  });

  it('adding acid to an acid food leaves it an acid food', () => {
    expect(classOf({ naturalPh: 3.5, acidAdded: true, equilibriumPh: 3.2, waterActivity: 0.95 })).toBe('acid');
  });

  it('refuses to classify pH above 4.6 with water activity 0.85 or below, which the section does not cover', () => {
    const result = classifyProduct({ naturalPh: 5.5, acidAdded: false, waterActivity: 0.85 });
    expect(result).toEqual({
      ok: false,
      reason: {
        code: 'outside-definitions',
        message:
          'With pH above 4.6 and water activity 0.85 or below this product is neither an acid nor a low-acid food under 21 CFR 114.3. Follow a tested recipe and ask your local extension service.',
      },
    });
  });

  it('gives the rule it applied', () => {
    expect(classifyProduct({ naturalPh: 4.2, acidAdded: false, waterActivity: 0.9 })).toEqual({
      ok: true,
      productClass: 'acid',
      rule: 'Natural pH is 4.6 or below: an acid food (21 CFR 114.3)',
    });
  });

  it('refuses bad measurements with clear messages', () => {
    expect(classifyProduct({ naturalPh: 15, acidAdded: false, waterActivity: 0.9 })).toEqual({
      ok: false,
      reason: { code: 'invalid-measurement', message: 'Natural pH must be between 0 and 14' },
    });
    expect(classifyProduct({ naturalPh: 5, acidAdded: true, waterActivity: 0.9 })).toEqual({
      ok: false,
      reason: { code: 'invalid-measurement', message: 'Give the finished equilibrium pH when acid is added' },
    });
    expect(classifyProduct({ naturalPh: 5, acidAdded: false, waterActivity: 1.2 })).toMatchObject({
      reason: { message: 'Water activity must be between 0 and 1' },
    });
  });
});

describe('requiresPressureCanning (USDA Guide 1: low-acid foods need a pressure canner)', () => {
  it('is true only for low-acid foods', () => {
    expect(requiresPressureCanning('low-acid')).toBe(true);
    expect(requiresPressureCanning('acid')).toBe(false);
    expect(requiresPressureCanning('acidified')).toBe(false);
  });
});
