import { describe, expect, it } from 'vitest';
import { findStarter, STARTER_RECIPES } from './starter-recipes.js';

/** Published tables the starters transcribe (shared/references.md sections 1 and 3). */
const PUBLISHED: [id: string, jar: string, pack: string, minutes: number[], source: string][] = [
  ['starter-tomatoes-in-water', 'pint', 'hot', [40, 45, 50, 55], 'USDA Guide 3 (1994 copy; 2015 table quoted)'],
  ['starter-tomatoes-in-water', 'quart', 'raw', [45, 50, 55, 60], 'USDA Guide 3'],
  ['starter-tomatoes-raw-no-liquid', 'quart', 'raw', [85, 90, 95, 100], 'USDA Guide 3 (secondary copy)'],
  ['starter-tomato-salsa', 'pint', 'hot', [15, 20, 25], 'NCHFP salsa (secondary copy)'],
  ['starter-hot-packed-jam', 'half-pint', 'hot', [5, 10, 15], 'USDA Guide 7 (secondary copy)'],
  ['starter-quick-dill-pickles', 'pint', 'raw', [10, 15, 20], 'USDA Guide 6'],
  ['starter-quick-dill-pickles', 'quart', 'raw', [15, 20, 25], 'USDA Guide 6'],
];

describe('the starter set', () => {
  it.each(PUBLISHED)('%s %s %s pack reproduces %j (%s)', (id, jar, pack, minutes) => {
    const row = findStarter(id)?.processing.boilingWater?.rows.find((r) => r.jarSize === jar && r.pack === pack);
    expect(row?.minutes).toEqual(minutes);
  });

  it('uses the published headspaces: jams 1/4 in, tomatoes, salsas and pickles 1/2 in, green beans 1 in (USDA Guide)', () => {
    const headspace = Object.fromEntries(STARTER_RECIPES.map((r) => [r.category, r.headspaceInches]));
    expect(headspace).toEqual({ tomatoes: 0.5, salsa: 0.5, jam: 0.25, pickles: 0.5, vegetables: 1 });
  });

  it('processes the low-acid vegetable only under pressure (21 CFR 114.3)', () => {
    const beans = findStarter('starter-green-beans-pressure');
    expect(beans?.productClass).toBe('low-acid');
    expect(beans?.processing.boilingWater).toBeUndefined();
    expect(beans?.processing.pressure?.rows.length).toBeGreaterThan(0);
  });
});
