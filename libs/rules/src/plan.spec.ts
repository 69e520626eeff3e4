import { describe, expect, it } from 'vitest';
import { planProcess, type PlanInput } from './plan.js';
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

const plan = (input: PlanInput) => {
  const result = planProcess(input);
  if (!result.ok) throw new Error(`Expected a plan, got ${result.reason.code}: ${result.reason.message}`);
  return result.plan;
};
const refusal = (input: PlanInput) => {
  const result = planProcess(input);
  if (result.ok) throw new Error('Expected a refusal, got a plan');
  return result.reason;
};

describe('planProcess: boiling water', () => {
  it('plans quarts of tomatoes at 1,001 ft: 50 min (USDA Guide 3, 1,001-3,000 ft band)', () => {
    const p = plan({
      recipe: tomatoesInWater,
      jarSize: 'quart',
      pack: 'hot',
      altitude: ft(1001),
      canner: boilingWaterCanner,
    });
    expect(p).toMatchObject({
      recipeName: 'Whole tomatoes in water',
      tested: true,
      productClass: 'acid',
      method: 'boiling-water',
      jarSize: 'quart',
      pack: 'hot',
      altitudeFt: 1001,
      band: { index: 1, label: '1,001–3,000 ft' },
      minutes: 50,
      pressure: null,
      ventMinutes: null,
      // USDA Guide 1: water 1 in over the jars; preheat to 180 °F for hot pack.
      water: { overJarsInches: 1, preheatF: 180 },
      // Time from a full rolling boil (USDA Guide 1, confirmed); if the boil is lost, the full time again
      // (USDA Guide 1, 2015; from memory).
      timing: { startsWhen: 'rolling-boil', ifLost: 'restart-full-time' },
      // Heat off, lid off, 5 min, lift upright (extension guidance citing Penn State).
      afterProcess: { method: 'boiling-water', restMinutes: 5 },
      // 50 min is not under 10 min: no sterilising, keep jars hot at about 180 °F (USDA Guide 1).
      jarPreparation: { sterilise: false, keepHotF: 180 },
      // 1/2 in for tomatoes (USDA Guide 1); 12.7 mm exactly.
      headspace: { inches: 0.5, mm: 12.7, label: '1/2 in (13 mm)' },
      jarsPerLoad: 7,
    });
    // Per quart: 2 Tbsp bottled lemon juice or 1/2 tsp citric acid (USDA Guide 3).
    expect(p.acidPerJar.map((a) => [a.acid, a.amount])).toEqual([
      ['bottled-lemon-juice', { value: 2, unit: 'tbsp' }],
      ['citric-acid', { value: 0.5, unit: 'tsp' }],
    ]);
    expect(p.acidPerJar.map((a) => a.text)).toEqual([
      '2 Tbsp bottled lemon juice (30 mL)',
      '1/2 tsp citric acid (2.5 mL)',
    ]);
    expect(p.timing.text).toContain('full rolling boil');
    expect(p.afterProcess.text).toBe(
      'Turn off the heat and take off the canner lid. Let the jars stand 5 minutes, then lift them straight up and out, keeping them upright.',
    );
  });

  it('plans raw-packed pints of tomatoes at sea level: 40 min, 1 Tbsp lemon juice or 1/4 tsp citric acid (USDA Guide 3)', () => {
    const p = plan({
      recipe: tomatoesInWater,
      jarSize: 'pint',
      pack: 'raw',
      altitude: ft(0),
      canner: boilingWaterCanner,
    });
    expect(p.minutes).toBe(40);
    expect(p.water).toEqual({ overJarsInches: 1, preheatF: 140 }); // raw pack: about 140 °F (USDA Guide 1)
    expect(p.acidPerJar.map((a) => a.text)).toEqual([
      '1 Tbsp bottled lemon juice (15 mL)',
      '1/4 tsp citric acid (1.25 mL)',
    ]);
    expect(p.jarsPerLoad).toBe(9);
  });

  it('plans tomatoes raw-packed without liquid above 6,000 ft: 100 min (USDA Guide 3)', () => {
    const p = plan({
      recipe: tomatoesRawNoLiquid,
      jarSize: 'quart',
      pack: 'raw',
      altitude: ft(6001),
      canner: boilingWaterCanner,
    });
    expect(p.minutes).toBe(100);
    expect(p.band.label).toBe('Above 6,000 ft');
  });

  it('reads metric altitudes: 304.8 m is the first band, 305 m the next', () => {
    const at = (metres: number) =>
      plan({ recipe: tomatoesInWater, jarSize: 'quart', pack: 'hot', altitude: m(metres), canner: boilingWaterCanner });
    expect(at(304.8).minutes).toBe(45);
    expect(at(304.8).altitudeFt).toBe(1000);
    expect(at(305).minutes).toBe(50);
  });

  it('sterilises jars for a 5-minute jam at or below 1,000 ft: boil 10 min (USDA Guide 1, Guide 7)', () => {
    const p = plan({
      recipe: hotPackJam,
      jarSize: 'half-pint',
      pack: 'hot',
      altitude: ft(1000),
      canner: boilingWaterCanner,
    });
    expect(p.minutes).toBe(5);
    expect(p.jarPreparation).toMatchObject({ sterilise: true, minutes: 10 });
    expect(p.headspace.label).toBe('1/4 in (6 mm)'); // jams, 1/4 in (USDA Guide 1)
    expect(p.acidPerJar).toEqual([]);
  });

  it('does not sterilise for the same jam at 1,001 ft, where the process is 10 min (not under 10)', () => {
    const p = plan({
      recipe: hotPackJam,
      jarSize: 'pint',
      pack: 'hot',
      altitude: ft(1001),
      canner: boilingWaterCanner,
    });
    expect(p.minutes).toBe(10);
    expect(p.jarPreparation).toMatchObject({ sterilise: false, keepHotF: 180 });
  });

  it('plans salsa and pickles from their three-band tables', () => {
    const salsa = plan({
      recipe: tomatoSalsa,
      jarSize: 'pint',
      pack: 'hot',
      altitude: ft(6000),
      canner: boilingWaterCanner,
    });
    expect([salsa.minutes, salsa.productClass]).toEqual([20, 'acidified']);
    const pickles = plan({
      recipe: dillPickles,
      jarSize: 'quart',
      pack: 'raw',
      altitude: ft(7000),
      canner: boilingWaterCanner,
    });
    expect(pickles.minutes).toBe(25);
  });

  it('lists the general cautions for a boiling-water load', () => {
    const p = plan({ recipe: tomatoSalsa, jarSize: 'pint', pack: 'hot', altitude: ft(0), canner: boilingWaterCanner });
    expect(p.cautionIds).toEqual([
      'tested-recipes',
      'altitude',
      'hot-jars-steam',
      'suspect-jars',
      'no-oven',
      'local-guidance',
    ]);
  });

  it('plans an untested recipe but says so', () => {
    const p = plan({
      recipe: { ...tomatoSalsa, tested: false },
      jarSize: 'pint',
      pack: 'hot',
      altitude: ft(0),
      canner: boilingWaterCanner,
    });
    expect(p.tested).toBe(false);
    expect(p.cautionIds[0]).toBe('tested-recipes');
  });

  it('accepts a stored recipe and canner that carry extra fields', () => {
    const stored = { ...tomatoSalsa, id: 'r1', source: 'NCHFP' } as RecipeRulesInput;
    const canner = { ...boilingWaterCanner, id: 'c1', name: 'Big pot' };
    expect(plan({ recipe: stored, jarSize: 'pint', pack: 'hot', altitude: ft(0), canner }).minutes).toBe(15);
  });
});

describe('planProcess: pressure', () => {
  // Minutes here are arbitrary test inputs (see the fixture); pounds are the standard gauge table (USDA Guide 1; PNW 421).
  it('uses 10 lb on a weighted gauge at or below 1,000 ft, vents 10 min and cools naturally (USDA 2015)', () => {
    const p = plan({
      recipe: pressureRulesOnly,
      jarSize: 'pint',
      pack: 'hot',
      altitude: ft(1000),
      canner: weightedCanner,
    });
    expect(p).toMatchObject({
      method: 'pressure',
      minutes: 33,
      pressure: { pounds: 10, gauge: 'weighted' },
      ventMinutes: 10,
      water: null,
      band: { label: '0–1,000 ft' },
      // Vent 10 min; time from the target pressure; if it falls, the full time again (USDA Guide 1; the restart
      // rule from memory).
      timing: { startsWhen: 'at-pressure', ifLost: 'restart-full-time' },
      // Natural cool-down to zero, then 10 min before opening: USDA 2015 (the 1994 text says 2 min).
      afterProcess: { method: 'pressure', coolDown: 'natural', waitAfterZeroMinutes: 10 },
      // Never sterilise for pressure canning (USDA Guide 1).
      jarPreparation: { sterilise: false, keepHotF: 180 },
      // Low-acid vegetables, 1 in (USDA Guide 1).
      headspace: { inches: 1, mm: 25.4, label: '1 in (25 mm)' },
      acidPerJar: [],
    });
    expect(p.timing.text).toContain('the 10 lb weight rocks');
    expect(p.cautionIds).toContain('low-acid-pressure');
    expect(p.cautionIds).not.toContain('dial-gauge-check');
  });

  it('uses 15 lb on a weighted gauge from 1,001 ft', () => {
    const p = plan({
      recipe: pressureRulesOnly,
      jarSize: 'quart',
      pack: 'hot',
      altitude: ft(1001),
      canner: weightedCanner,
    });
    expect([p.pressure?.pounds, p.minutes]).toEqual([15, 37]);
  });

  it('uses 13 lb on a dial gauge at 4,001-6,000 ft, and asks for the yearly gauge check (PNW 421)', () => {
    const p = plan({ recipe: pressureRulesOnly, jarSize: 'pint', pack: 'hot', altitude: m(1524), canner: dialCanner });
    expect(p.pressure).toEqual({ pounds: 13, gauge: 'dial' });
    expect(p.band.label).toBe('4,001–6,000 ft');
    expect(p.timing.text).toContain('the dial reads 13 lb');
    expect(p.cautionIds).toContain('dial-gauge-check');
  });
});

describe('planProcess refusals', () => {
  it('refuses a low-acid product in a boiling-water canner', () => {
    expect(
      refusal({ recipe: pressureRulesOnly, jarSize: 'pint', pack: 'hot', altitude: ft(0), canner: boilingWaterCanner }),
    ).toEqual({
      code: 'low-acid-needs-pressure',
      message:
        'Pressure test vegetable is a low-acid food and must be processed in a pressure canner; a boiling-water canner cannot make it safe.',
    });
  });

  it('refuses a boiling-water recipe in a pressure canner', () => {
    expect(
      refusal({ recipe: tomatoesInWater, jarSize: 'quart', pack: 'hot', altitude: ft(0), canner: weightedCanner }),
    ).toEqual({
      code: 'method-mismatch',
      message: 'Whole tomatoes in water has a tested boiling-water process only; choose a boiling-water canner.',
    });
  });

  it('refuses a pressure recipe in a boiling-water canner', () => {
    const acidPressureOnly: RecipeRulesInput = {
      ...pressureRulesOnly,
      name: 'Pressure-only fruit',
      productClass: 'acid',
    };
    expect(
      refusal({ recipe: acidPressureOnly, jarSize: 'pint', pack: 'hot', altitude: ft(0), canner: boilingWaterCanner }),
    ).toEqual({
      code: 'method-mismatch',
      message: 'Pressure-only fruit has a tested pressure process only; choose a pressure canner.',
    });
  });

  it('refuses a jar size or pack with no tested time, naming the tested ones', () => {
    expect(
      refusal({
        recipe: tomatoesRawNoLiquid,
        jarSize: 'pint',
        pack: 'hot',
        altitude: ft(0),
        canner: boilingWaterCanner,
      }),
    ).toEqual({
      code: 'no-tested-time',
      message:
        'Raw-packed tomatoes without liquid has no tested boiling-water time for pint jars, hot pack. Tested: pint jars, raw pack; quart jars, raw pack.',
    });
    expect(
      refusal({ recipe: pressureRulesOnly, jarSize: 'pint', pack: 'raw', altitude: ft(0), canner: dialCanner }).code,
    ).toBe('no-tested-time');
  });

  it('refuses a canner that cannot take the jar size', () => {
    const quartsOnly = { method: 'boiling-water' as const, gauge: null, capacity: { quart: 7, pint: 0 } };
    const expected = { code: 'canner-jar-size', message: 'This canner is not set up to hold half-pint jars.' };
    expect(
      refusal({ recipe: hotPackJam, jarSize: 'half-pint', pack: 'hot', altitude: ft(0), canner: quartsOnly }),
    ).toEqual(expected);
    expect(refusal({ recipe: hotPackJam, jarSize: 'pint', pack: 'hot', altitude: ft(0), canner: quartsOnly })).toEqual({
      code: 'canner-jar-size',
      message: 'This canner is not set up to hold pint jars.',
    });
  });

  it('refuses an altitude beyond a closed boiling-water table', () => {
    const closed: RecipeRulesInput = {
      ...hotPackJam,
      name: 'Closed-table jam',
      processing: { boilingWater: { bands: [1000, 8000], rows: [{ jarSize: 'pint', pack: 'hot', minutes: [5, 10] }] } },
    };
    expect(
      refusal({ recipe: closed, jarSize: 'pint', pack: 'hot', altitude: ft(8001), canner: boilingWaterCanner }),
    ).toEqual({
      code: 'altitude-beyond-table',
      message: "Closed-table jam: This recipe's table stops at 1,001–8,000 ft; there is no tested time above 8,000 ft.",
    });
  });

  it('refuses pressure canning above 10,000 ft', () => {
    expect(
      refusal({ recipe: pressureRulesOnly, jarSize: 'pint', pack: 'hot', altitude: ft(10001), canner: dialCanner }),
    ).toEqual({
      code: 'altitude-beyond-table',
      message:
        'Pressure test vegetable: The pressure tables stop at 10,000 ft; Jarday gives no canning pressure above that. Ask your local extension service.',
    });
  });

  it('refuses invalid input with the field and the reason', () => {
    const base = {
      recipe: tomatoSalsa,
      jarSize: 'pint',
      pack: 'hot',
      altitude: ft(0),
      canner: boilingWaterCanner,
    } as const;
    expect(refusal({ ...base, altitude: ft(20000) })).toEqual({
      code: 'invalid-input',
      message: 'altitude.value: Altitude must be between -1500 and 15000 ft (-457 to 4,572 m)',
    });
    expect(refusal({ ...base, canner: { method: 'pressure', gauge: null, capacity: { pint: 9 } } })).toEqual({
      code: 'invalid-input',
      message: 'canner.gauge: A pressure canner needs a gauge type (weighted or dial); a boiling-water canner has none',
    });
    expect(refusal({ ...base, pack: 'cold' as never })).toEqual({
      code: 'invalid-input',
      message: 'pack: Pack style must be hot or raw',
    });
    const badBands = {
      ...tomatoSalsa,
      processing: {
        boilingWater: { bands: [6000, 1000, null], rows: [{ jarSize: 'pint', pack: 'hot', minutes: [15, 20, 25] }] },
      },
    } as RecipeRulesInput;
    expect(refusal({ ...base, recipe: badBands })).toEqual({
      code: 'invalid-input',
      message: 'recipe.processing.boilingWater.bands.1: Band bounds must strictly increase: 1,000 ft follows 6,000 ft',
    });
  });
});
