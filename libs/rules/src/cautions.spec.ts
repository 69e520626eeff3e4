import { describe, expect, it } from 'vitest';
import { CAUTION_IDS, CAUTION_LIST, CAUTIONS, cautionsFor, planCautions } from './cautions.js';

describe('cautions', () => {
  it('has one entry per id, in order, each with a title and text', () => {
    expect(CAUTION_LIST.map((c) => c.id)).toEqual([...CAUTION_IDS]);
    for (const caution of CAUTION_LIST) {
      expect(caution.title.length).toBeGreaterThan(0);
      expect(caution.text.length).toBeGreaterThan(40);
    }
  });

  it('salsas: only spices and herbs may change (NCHFP salsa recipe, confirmed)', () => {
    expect(CAUTIONS['salsa-changes'].text).toMatch(/spices and herbs/);
  });

  it('the botulism caution carries the disposal advice of USDA Guide 1 (confirmed)', () => {
    const text = CAUTIONS['suspect-jars'].text;
    for (const sign of ['bulging lid', 'leaks', 'spurting', 'rising bubbles', 'colour', 'smell', 'mould']) {
      expect(text).toContain(sign);
    }
    expect(text).toContain('two bags'); // sealed suspect jars, double-bagged into the trash
    expect(text).toContain('boiling them 30 minutes in water 1 inch above the jars'); // leaking or unsealed jars
  });

  it('dial gauges are checked every year (PNW 421, confirmed)', () => {
    expect(CAUTIONS['dial-gauge-check'].text).toContain('every year');
  });

  it('never calls an oven safe (NCHFP, confirmed)', () => {
    expect(CAUTIONS['no-oven'].text).toContain('does not heat food in jars safely');
    expect(CAUTIONS['no-oven'].text).toContain('hot water rather than in an oven');
  });

  it('defers to the extension service and, for food that is sold, local codes and licensed practice', () => {
    expect(CAUTIONS['local-guidance'].text).toContain('local extension service');
    expect(CAUTIONS['local-guidance'].text).toContain('local food codes and licensed practice');
  });
});

describe('cautionsFor', () => {
  it('boiling water: the general cautions', () => {
    expect(cautionsFor({ method: 'boiling-water', productClass: 'acid', gauge: null })).toEqual([
      'tested-recipes',
      'altitude',
      'hot-jars-steam',
      'suspect-jars',
      'no-oven',
      'local-guidance',
    ]);
  });

  it('pressure with a dial gauge adds the low-acid and gauge cautions', () => {
    expect(cautionsFor({ method: 'pressure', productClass: 'low-acid', gauge: 'dial' })).toEqual([
      'tested-recipes',
      'altitude',
      'low-acid-pressure',
      'hot-jars-steam',
      'suspect-jars',
      'dial-gauge-check',
      'no-oven',
      'local-guidance',
    ]);
    expect(cautionsFor({ method: 'pressure', productClass: 'low-acid', gauge: 'weighted' })).not.toContain(
      'dial-gauge-check',
    );
  });
});

describe('planCautions', () => {
  it('puts the salsa caution second for a salsa only (NCHFP: only spices and herbs may change)', () => {
    const ids = cautionsFor({ method: 'boiling-water', productClass: 'acidified', gauge: null });
    const salsa = planCautions(ids, { isSalsa: true }).map((c) => c.id);
    const jam = planCautions(ids, { isSalsa: false }).map((c) => c.id);
    expect(salsa).toEqual([ids[0], 'salsa-changes', ...ids.slice(1)]);
    expect(jam).toEqual(ids);
  });
});
