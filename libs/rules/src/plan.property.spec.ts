import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { bandGate } from './after-canner.js';
import { gaugePressure } from './gauge-pressure.js';
import { MAX_ALTITUDE_FT, METRES_PER_FOOT, MIN_ALTITUDE_FT } from './kitchen.js';
import { planProcess, type CannerRules, type PlanInput } from './plan.js';
import type { RecipeRulesInput } from './recipe.js';
import {
  boilingWaterCanner,
  dialCanner,
  dillPickles,
  ft,
  hotPackJam,
  m,
  pressureRulesOnly,
  tomatoesInWater,
  tomatoesRawNoLiquid,
  tomatoSalsa,
  weightedCanner,
} from './testing/published-recipes.js';

/** Every published jar/pack pair of every published table, with the canner to use. */
const CASES: [RecipeRulesInput, PlanInput['jarSize'], PlanInput['pack'], CannerRules][] = [
  [tomatoesInWater, 'pint', 'hot', boilingWaterCanner],
  [tomatoesInWater, 'quart', 'raw', boilingWaterCanner],
  [tomatoesRawNoLiquid, 'quart', 'raw', boilingWaterCanner],
  [tomatoSalsa, 'pint', 'hot', boilingWaterCanner],
  [hotPackJam, 'half-pint', 'hot', boilingWaterCanner],
  [dillPickles, 'pint', 'raw', boilingWaterCanner],
  [dillPickles, 'quart', 'raw', boilingWaterCanner],
  [pressureRulesOnly, 'pint', 'hot', weightedCanner],
  [pressureRulesOnly, 'quart', 'hot', dialCanner],
];
const caseArb = fc.constantFrom(...CASES);
const feetArb = fc.double({ min: MIN_ALTITUDE_FT, max: MAX_ALTITUDE_FT, noNaN: true });
const PRESSURE_TOP_FT = 10000;

const planAt = ([recipe, jarSize, pack, canner]: (typeof CASES)[number], altitude: PlanInput['altitude']) =>
  planProcess({ recipe, jarSize, pack, altitude, canner });

describe('properties', () => {
  it('process time never falls as altitude rises', () => {
    fc.assert(
      fc.property(caseArb, feetArb, feetArb, (c, a, b) => {
        const [low, high] = a <= b ? [a, b] : [b, a];
        const top = c[3].method === 'pressure' ? PRESSURE_TOP_FT : MAX_ALTITUDE_FT;
        fc.pre(high <= top);
        const p1 = planAt(c, ft(low));
        const p2 = planAt(c, ft(high));
        if (!p1.ok || !p2.ok) throw new Error('Every published case plans within its table');
        expect(p2.plan.minutes).toBeGreaterThanOrEqual(p1.plan.minutes);
      }),
    );
  });

  it('gauge pressure never falls as altitude rises, for either gauge', () => {
    const upTo10k = fc.double({ min: MIN_ALTITUDE_FT, max: PRESSURE_TOP_FT, noNaN: true });
    fc.assert(
      fc.property(fc.constantFrom('weighted' as const, 'dial' as const), upTo10k, upTo10k, (gauge, a, b) => {
        const [low, high] = a <= b ? [a, b] : [b, a];
        const p1 = gaugePressure(gauge, ft(low));
        const p2 = gaugePressure(gauge, ft(high));
        if (!p1.ok || !p2.ok) throw new Error('Pressures exist up to 10,000 ft');
        expect(p2.pounds).toBeGreaterThanOrEqual(p1.pounds);
      }),
    );
  });

  it('the same plan for an altitude in feet and the equivalent metres', () => {
    fc.assert(
      fc.property(caseArb, fc.integer({ min: MIN_ALTITUDE_FT, max: MAX_ALTITUDE_FT }), (c, feet) => {
        expect(planAt(c, m(feet * METRES_PER_FOOT))).toEqual(planAt(c, ft(feet)));
      }),
    );
    fc.assert(
      fc.property(caseArb, fc.integer({ min: -457, max: 4572 }), (c, metres) => {
        expect(planAt(c, ft(metres / METRES_PER_FOOT))).toEqual(planAt(c, m(metres)));
      }),
    );
  });

  it('the band gate refuses every time before 12 h after lifting and allows every time from 12 h', () => {
    const liftedAt = new Date('2025-08-30T15:00:00.000Z');
    const twelveHoursMs = 12 * 60 * 60 * 1000;
    fc.assert(
      fc.property(fc.integer({ min: 0, max: twelveHoursMs - 1 }), (elapsed) => {
        const gate = bandGate(liftedAt, new Date(liftedAt.getTime() + elapsed));
        expect(gate.allowed).toBe(false);
        if (!gate.allowed) expect(gate.remainingMs).toBe(twelveHoursMs - elapsed);
      }),
    );
    fc.assert(
      fc.property(fc.integer({ min: twelveHoursMs, max: 30 * twelveHoursMs }), (elapsed) => {
        expect(bandGate(liftedAt, new Date(liftedAt.getTime() + elapsed)).allowed).toBe(true);
      }),
    );
  });
});
