import { describe, expect, it } from 'vitest';
import { estimateComeUp } from './come-up.js';
import { planDay, TIMELINE_DEFAULTS, type DayPlanInput, type PlannedStep } from './day-plan.js';
import {
  boilingWaterCanner,
  ft,
  hotPackJam,
  pressureRulesOnly,
  tomatoesInWater,
  weightedCanner,
} from './testing/published-recipes.js';

const MIN = 60_000;
const T = new Date('2026-08-15T13:00:00.000Z');
const at = (minutes: number) => new Date(T.getTime() + minutes * MIN);
// No history and no water or burner figures: the published 20-30 min, upper end (USDA Guide 1, confirmed).
const comeUpMs = estimateComeUp({ altitude: ft(2350) }).ms;
const prepSteps = [
  { kind: 'blanch', label: 'Dip tomatoes until the skins split', seconds: 60 },
  { kind: 'peel', label: 'Slip off the skins' },
  { kind: 'hot-hold', label: 'Keep jars hot' },
];
const pintCanner = (id: string) => ({ ...boilingWaterCanner, id, name: `Pot ${id}`, capacity: { pint: 9 }, comeUpMs });
const tomatoes18 = { recipe: tomatoesInWater, prepSteps, jarSize: 'pint', pack: 'hot', jars: 18 } as const;

function plan(input: Partial<DayPlanInput>) {
  const result = planDay({
    batches: [tomatoes18],
    canners: [pintCanner('a')],
    altitude: ft(2350),
    startAt: T,
    ...input,
  });
  if (!result.ok) throw new Error(result.reasons.map((r) => r.message).join('; '));
  return result.plan;
}
const step = (steps: PlannedStep[], kind: PlannedStep['kind'], loadNumber: number | null = null) =>
  steps.find((s) => s.kind === kind && (loadNumber === null || s.loadNumber === loadNumber));

describe('planDay: 18 pints of whole tomatoes in one 9-pint canner at 2,350 ft', () => {
  const day = plan({});
  const { untimedStepMinutes: prep, fillMinutes: fill } = TIMELINE_DEFAULTS;
  const comeUp = comeUpMs / MIN; // 30
  // Whole tomatoes in water, pints, 1,001-3,000 ft: 45 min (USDA Guide 3, confirmed; references table 1).
  const processMin = 45;
  const rest = 5; // heat off, lid off, 5 min before lifting (Penn State extension, confirmed)

  it('makes two loads of 9 pints with the 45-minute time of the 1,001-3,000 ft band', () => {
    expect(day.jarsBySize).toEqual([{ jarSize: 'pint', jars: 18 }]);
    expect(day.loads.map((l) => [l.number, l.jars, l.plan.minutes, l.plan.band.toFt])).toEqual([
      [1, 9, processMin, 3000],
      [2, 9, processMin, 3000],
    ]);
  });

  it('times the day by hand: prep, fill, heating from first lid-on minus the come-up, process, rest, lift', () => {
    const ready = 2 * prep; // blanching dips, then peeling; the hot-hold step is the jars' own line
    const lid1 = ready + fill;
    const lift1 = lid1 + comeUp + processMin + rest;
    const lid2 = lift1; // the next load goes in when the first comes out
    const lift2 = lid2 + comeUp + processMin + rest;
    expect(step(day.steps, 'blanch')).toMatchObject({ startAt: T, endAt: at(prep), estimated: true });
    expect(step(day.steps, 'blanch')?.detail).toBe('Dips of 30 to 60 s (the recipe says 60 s)');
    expect(step(day.steps, 'heat-water')).toMatchObject({ startAt: at(lid1 - comeUp), endAt: at(lid1) });
    expect(day.heatingStartAt).toEqual(at(lid1 - comeUp));
    expect(step(day.steps, 'warm-jars')).toMatchObject({ startAt: T, endAt: at(ready) });
    const [one, two] = day.loads;
    expect(one).toMatchObject({ fillAt: at(ready), lidOnAt: at(lid1), processStartAt: at(lid1 + comeUp) });
    expect(one).toMatchObject({ processEndAt: at(lid1 + comeUp + processMin), liftAt: at(lift1) });
    expect(two).toMatchObject({ fillAt: at(lid2 - fill), lidOnAt: at(lid2), liftAt: at(lift2) });
    expect(step(day.steps, 'rest', 1)).toMatchObject({ startAt: at(lift1 - rest), endAt: at(lift1) });
    expect(day.endAt).toEqual(at(lift2));
  });

  it('lets the bands come off 12 h after each lift, and all of them 12 h after the last (USDA Guide 1)', () => {
    expect(day.loads[0]?.bandsOff.earliestAt).toEqual(new Date(day.loads[0]!.liftAt.getTime() + 12 * 60 * MIN));
    expect(day.bandsOff.earliestAt).toEqual(new Date(day.endAt.getTime() + 12 * 60 * MIN));
    expect(day.bandsOff.recommendedAt).toEqual(new Date(day.endAt.getTime() + 24 * 60 * MIN));
    expect(day.steps.at(-1)).toMatchObject({ kind: 'bands-off', startAt: day.bandsOff.earliestAt });
  });

  it('lists the steps in time order', () => {
    const times = day.steps.map((s) => s.startAt.getTime());
    expect(times).toEqual([...times].sort((a, b) => a - b));
  });
});

describe('planDay: batches by produce, two canners, other methods', () => {
  it('counts jars from produce weight: 26 lb of tomatoes fills 18 pints (13 lb per 9 pints, USDA Guide 3)', () => {
    const day = plan({ batches: [{ ...tomatoes18, jars: undefined, produce: { value: 26, unit: 'lb' } }] });
    expect(day.batches[0]).toMatchObject({ jars: 18, partialJar: 0, leftoverProduce: null });
  });

  it('runs two canners in parallel: the second load goes into the free canner one fill later', () => {
    const day = plan({ canners: [pintCanner('a'), pintCanner('b')] });
    const [one, two] = day.loads;
    expect([one?.cannerId, two?.cannerId]).toEqual(['a', 'b']);
    const fill = TIMELINE_DEFAULTS.fillMinutes;
    expect(two?.lidOnAt.getTime()).toBe((one?.lidOnAt.getTime() ?? 0) + fill * MIN);
    const heats = day.steps.filter((s) => s.kind === 'heat-water');
    expect(heats.map((h) => [h.cannerId, h.endAt.getTime() - h.startAt.getTime()])).toEqual([
      ['a', comeUpMs],
      ['b', comeUpMs],
    ]);
    expect(day.endAt.getTime()).toBeLessThan(plan({}).endAt.getTime());
  });

  it('never starts heating before the day starts, however long the come-up', () => {
    const slow = { ...pintCanner('a'), comeUpMs: 90 * MIN };
    const day = plan({ canners: [slow] });
    expect(day.heatingStartAt).toEqual(T);
    expect(day.loads[0]?.lidOnAt).toEqual(at(90));
  });

  it('sterilises jars for a jam processed under 10 minutes at sea level (USDA Guide 1)', () => {
    const jam = { recipe: hotPackJam, jarSize: 'half-pint', pack: 'hot', jars: 12 } as const;
    const day = plan({ batches: [jam], canners: [{ ...boilingWaterCanner, id: 'a', comeUpMs }], altitude: ft(0) });
    expect(day.loads[0]?.plan.minutes).toBe(5);
    expect(step(day.steps, 'warm-jars')?.label).toBe('Sterilise jars 10 min');
  });

  it('plans a pressure load with its 10-minute vent and a natural cool-down (USDA Guide 1)', () => {
    const beans = { recipe: pressureRulesOnly, jarSize: 'quart', pack: 'hot', jars: 7 } as const;
    const day = plan({ batches: [beans], canners: [{ ...weightedCanner, id: 'p', comeUpMs }] });
    const kinds = day.steps.filter((s) => s.loadNumber === 1 && s.station === 'canner').map((s) => s.kind);
    expect(kinds).toEqual(['come-up', 'vent', 'pressurize', 'process', 'cool-down', 'rest', 'lift']);
    const vent = step(day.steps, 'vent');
    expect((vent?.endAt.getTime() ?? 0) - (vent?.startAt.getTime() ?? 0)).toBe(10 * MIN);
    // Weighted gauge, 2,001-4,000 ft: 15 lb (USDA Guide; PNW 421).
    expect(day.loads[0]?.plan.pressure).toEqual({ pounds: 15, gauge: 'weighted' });
  });
});

describe('planDay: refusals', () => {
  const refused = (input: Partial<DayPlanInput>) => {
    const result = planDay({
      batches: [tomatoes18],
      canners: [pintCanner('a')],
      altitude: ft(2350),
      startAt: T,
      ...input,
    });
    if (result.ok) throw new Error('expected a refusal');
    return result.reasons;
  };

  it('refuses a low-acid recipe with only a boiling-water canner, naming the batch', () => {
    const beans = { recipe: pressureRulesOnly, jarSize: 'pint', pack: 'hot', jars: 9 } as const;
    expect(refused({ batches: [tomatoes18, beans] })).toEqual([
      expect.objectContaining({ code: 'low-acid-needs-pressure', batchIndex: 1 }),
    ]);
  });

  it('refuses an acid recipe with only a pressure canner (method mismatch)', () => {
    expect(refused({ canners: [{ ...weightedCanner, id: 'p', comeUpMs }] })).toEqual([
      expect.objectContaining({ code: 'method-mismatch', batchIndex: 0 }),
    ]);
  });

  it('uses the canner that fits when one of two does not', () => {
    const result = planDay({
      batches: [tomatoes18],
      canners: [{ ...weightedCanner, id: 'p', comeUpMs }, pintCanner('a')],
      altitude: ft(2350),
      startAt: T,
    });
    expect(result.ok && result.plan.loads.every((l) => l.cannerId === 'a')).toBe(true);
  });

  it('refuses a produce weight for a jar size without a published yield, and bad input', () => {
    const halfPints = {
      ...tomatoes18,
      jarSize: 'half-pint',
      jars: undefined,
      produce: { value: 5, unit: 'lb' },
    } as const;
    expect(refused({ batches: [halfPints] })[0]).toMatchObject({ code: 'no-yield', batchIndex: 0 });
    expect(refused({ batches: [] })[0]).toMatchObject({
      code: 'invalid-input',
      message: 'batches: Choose at least one recipe',
    });
    const both = { ...tomatoes18, produce: { value: 5, unit: 'lb' } } as const;
    expect(refused({ batches: [both] })[0]).toMatchObject({ code: 'invalid-input', batchIndex: 0 });
    expect(refused({ canners: [pintCanner('a'), pintCanner('b'), pintCanner('c')] })[0]?.message).toBe(
      'canners: One canner or two',
    );
  });
});
