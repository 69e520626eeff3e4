import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { boilingPoint } from './boiling-point.js';
import {
  ASSUMED_BURNER_EFFICIENCY,
  estimateComeUp,
  heatingSeconds,
  median,
  PUBLISHED_COME_UP_MINUTES,
  WATER_DENSITY_KG_PER_M3,
  WATER_SPECIFIC_HEAT_J_PER_KG_K,
} from './come-up.js';
import { ft } from './testing/published-recipes.js';

const MIN = 60_000;
const seaLevel = ft(0);

describe('median', () => {
  it('is the middle value of an odd count and the mean of the two middle values of an even count', () => {
    expect(median([30, 10, 20])).toBe(20);
    expect(median([40, 10, 30, 20])).toBe(25);
    expect(() => median([])).toThrow(RangeError);
  });
});

describe('estimateComeUp: the fallback order', () => {
  it('prefers the kitchen history over the water and burner, and names the count and median', () => {
    const history = [22 * MIN, 26 * MIN, 24 * MIN, 30 * MIN, 21 * MIN];
    const estimate = estimateComeUp({ history, waterLitres: 20, burnerWatts: 3000, altitude: seaLevel });
    expect(estimate).toMatchObject({ source: 'history', ms: 24 * MIN, minutes: 24, samples: 5 });
    expect(estimate.detail).toBe('learned from 5 logged loads: median 24 min');
  });

  it('takes the mean of the two middle come-ups for an even history', () => {
    expect(estimateComeUp({ history: [20 * MIN, 23 * MIN, 25 * MIN, 40 * MIN], altitude: seaLevel }).ms).toBe(24 * MIN);
  });

  it('drops mis-taps (under a minute, over three hours) before taking the median', () => {
    const estimate = estimateComeUp({ history: [5_000, 25 * MIN, 4 * 60 * MIN], altitude: seaLevel });
    expect(estimate).toMatchObject({ source: 'history', ms: 25 * MIN, samples: 1 });
    expect(estimate.detail).toBe('learned from 1 logged load: median 25 min');
  });

  it('with no usable history uses physics when both water and burner are known', () => {
    const estimate = estimateComeUp({ history: [1_000], waterLitres: 20, burnerWatts: 3000, altitude: seaLevel });
    expect(estimate.source).toBe('physics');
    expect(estimate.detail).toMatch(/^estimated from 20 L and 3,000 W: about \d+ min/);
  });

  it('with neither history nor both figures uses the published 20-30 min, allowing 30 (USDA Guide 1, confirmed)', () => {
    for (const input of [{}, { waterLitres: 20 }, { burnerWatts: 3000 }]) {
      const estimate = estimateComeUp({ ...input, altitude: seaLevel });
      expect(estimate).toMatchObject({ source: 'published', minutes: 30, ms: 30 * MIN, range: { min: 20, max: 30 } });
      expect(estimate.detail).toBe('published range 20–30 min, no history: the plan allows 30 min');
    }
    expect(PUBLISHED_COME_UP_MINUTES).toEqual({ min: 20, max: 30 });
  });

  it('refuses nonsense figures', () => {
    expect(() => estimateComeUp({ waterLitres: -1, burnerWatts: 3000, altitude: seaLevel })).toThrow(/more than 0 L/);
    expect(() => estimateComeUp({ waterLitres: 20, burnerWatts: 0, altitude: seaLevel })).toThrow(/more than 0 W/);
  });
});

describe('the physics estimate', () => {
  it('is Q = rho V c dT over the effective power, worked by hand for 20 L on 3,000 W at sea level from 140 °F', () => {
    // Boiling point at sea level from ICAO + IAPWS-IF97: 99.97 °C (published tables give 212 °F, Colorado State
    // extension, confirmed). 140 °F = 60 °C. Density 997.047 kg/m³ and cp 4181.3 J/(kg K): IAPWS-95 at 25 °C,
    // from memory. Efficiency 0.6: an assumption.
    const deltaK = boilingPoint(seaLevel).celsius - 60;
    expect(deltaK).toBeCloseTo(39.97, 2);
    const joules = 0.02 * WATER_DENSITY_KG_PER_M3 * WATER_SPECIFIC_HEAT_J_PER_KG_K * deltaK;
    const seconds = joules / (3000 * ASSUMED_BURNER_EFFICIENCY);
    expect(seconds).toBeCloseTo(1852, 0); // 19.94 kg x 4181.3 x 39.97 K / 1,800 W: about 31 min
    expect(heatingSeconds({ waterLitres: 20, burnerWatts: 3000, altitude: seaLevel })).toBeCloseTo(seconds, 6);
    expect(estimateComeUp({ waterLitres: 20, burnerWatts: 3000, altitude: seaLevel }).ms).toBeCloseTo(
      seconds * 1000,
      3,
    );
  });

  it('boils sooner up high, where water boils cooler (203 °F at 5,000 ft, Colorado State extension, confirmed)', () => {
    const low = heatingSeconds({ waterLitres: 20, burnerWatts: 3000, altitude: seaLevel });
    const high = heatingSeconds({ waterLitres: 20, burnerWatts: 3000, altitude: ft(5000) });
    // From 140 °F: 72 °F to heat at sea level against about 63 °F at 5,000 ft.
    expect(high / low).toBeCloseTo((203 - 140) / (212 - 140), 1);
  });

  it('more water takes longer, more power is quicker, warmer water is quicker (properties)', () => {
    // Tenths of a litre and whole watts: two nearly equal doubles can round to the same time.
    const litres = fc.integer({ min: 10, max: 1000 }).map((n) => n / 10);
    const watts = fc.integer({ min: 500, max: 10_000 });
    fc.assert(
      fc.property(litres, litres, watts, (a, b, w) => {
        fc.pre(a < b);
        const t = (l: number) => heatingSeconds({ waterLitres: l, burnerWatts: w, altitude: seaLevel });
        return t(a) < t(b);
      }),
    );
    fc.assert(
      fc.property(litres, watts, watts, (l, a, b) => {
        fc.pre(a < b);
        const t = (w: number) => heatingSeconds({ waterLitres: l, burnerWatts: w, altitude: seaLevel });
        return t(b) < t(a);
      }),
    );
    expect(heatingSeconds({ waterLitres: 20, burnerWatts: 3000, altitude: seaLevel, fromF: 180 })).toBeLessThan(
      heatingSeconds({ waterLitres: 20, burnerWatts: 3000, altitude: seaLevel, fromF: 140 }),
    );
  });
});
