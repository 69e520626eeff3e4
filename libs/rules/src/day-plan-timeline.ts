import type { ProcessPlan } from './plan.js';

const MIN = 60_000;

/**
 * Allowances the planner uses where no published time exists. They are assumptions for planning only: the live
 * day times nothing from them (the process timer waits for the boil a person confirms).
 */
export const TIMELINE_DEFAULTS = {
  /** Each untimed prep step (peeling, chopping, working produce through blanching dips). */
  untimedStepMinutes: 15,
  /** Filling one load: headspace, bubbles, rims, lids and bands. */
  fillMinutes: 10,
  /** Pressure canning: from the vent closing to the target pressure. */
  pressureComeUpMinutes: 10,
  /** Pressure canning: a full canner falling to zero by itself, often 30-60 minutes (from memory). */
  pressureCoolDownMinutes: 45,
} as const;

export type StepKind =
  | 'heat-water'
  | 'blanch'
  | 'simmer'
  | 'prep'
  | 'warm-jars'
  | 'fill'
  | 'come-up'
  | 'vent'
  | 'pressurize'
  | 'process'
  | 'rest'
  | 'cool-down'
  | 'lift'
  | 'bands-off';

export interface PlannedStep {
  kind: StepKind;
  label: string;
  detail: string | null;
  /** Where it happens: the prep counter, the jar pot, the filling station or a canner. */
  station: 'prep' | 'jars' | 'fill' | 'canner';
  cannerId: string | null;
  batchIndex: number | null;
  loadNumber: number | null;
  startAt: Date;
  /** Equal to startAt for a moment (lifting, bands off). */
  endAt: Date;
  /** True when the duration is one of the planner's allowances rather than a recipe or published time. */
  estimated: boolean;
}

export interface LoadSlot {
  batchIndex: number;
  cannerId: string;
  jars: number;
  plan: ProcessPlan;
  fillAt: number;
  lidOnAt: number;
  processStartAt: number;
  processEndAt: number;
  liftAt: number;
}

interface TimelineInput {
  startAt: number;
  batches: { recipeName: string; jars: number; prepSteps: { kind: string; label: string; seconds: number | null }[] }[];
  /** Per batch, the canners that can process it and their plans. */
  fits: { cannerId: string; plan: ProcessPlan }[][];
  canners: { id: string; name: string; comeUpMs: number }[];
  untimedStepMs: number;
  fillMs: number;
}

type Step = Omit<PlannedStep, 'startAt' | 'endAt'> & { startAt: number; endAt: number };
const none = { cannerId: null, batchIndex: null, loadNumber: null, detail: null, estimated: false };

/** Prep steps of a batch in the recipe's order, one after another at the prep counter. Jar holding is separate. */
function prepSteps(b: TimelineInput['batches'][number], batchIndex: number, from: number, untimedMs: number): Step[] {
  let at = from;
  const steps: Step[] = [];
  for (const p of b.prepSteps) {
    if (p.kind === 'hot-hold') continue;
    const blanch = p.kind === 'blanch';
    const timed = !blanch && p.seconds !== null;
    const ms = timed ? (p.seconds ?? 0) * 1000 : untimedMs;
    const kind = blanch ? 'blanch' : p.kind === 'simmer' ? 'simmer' : 'prep';
    const detail = blanch ? `Dips of 30 to 60 s${p.seconds ? ` (the recipe says ${p.seconds} s)` : ''}` : null;
    steps.push({
      ...none,
      kind,
      label: `${b.recipeName}: ${p.label}`,
      detail,
      station: 'prep',
      batchIndex,
      startAt: at,
      endAt: at + ms,
      estimated: !timed,
    });
    at += ms;
  }
  return steps;
}

/** The canner steps of one load from lid on to lift, with their published times where there are any. */
function cannerSteps(slot: LoadSlot, number: number, comeUpMs: number): { steps: Step[]; liftAt: number } {
  const { plan } = slot;
  const base = {
    ...none,
    station: 'canner' as const,
    cannerId: slot.cannerId,
    batchIndex: slot.batchIndex,
    loadNumber: number,
  };
  const steps: Step[] = [];
  let at = slot.lidOnAt;
  const add = (kind: StepKind, label: string, ms: number, detail: string | null, estimated = false) => {
    steps.push({ ...base, kind, label, detail, startAt: at, endAt: at + ms, estimated });
    at += ms;
  };
  const pressure = plan.method === 'pressure';
  add('come-up', pressure ? 'Lid on: heat until steam flows' : 'Lid on: bring to a rolling boil', comeUpMs, null);
  if (pressure && plan.pressure && plan.afterProcess.method === 'pressure') {
    add('vent', 'Vent the steam', (plan.ventMinutes ?? 10) * MIN, `${plan.ventMinutes ?? 10} min, then close the vent`);
    add(
      'pressurize',
      `Bring up to ${plan.pressure.pounds} lb`,
      TIMELINE_DEFAULTS.pressureComeUpMinutes * MIN,
      'Watch the gauge',
      true,
    );
    slot.processStartAt = at;
    add('process', `Process ${plan.minutes} min at ${plan.pressure.pounds} lb`, plan.minutes * MIN, plan.timing.text);
    slot.processEndAt = at;
    add(
      'cool-down',
      'Heat off: let the pressure fall to zero by itself',
      TIMELINE_DEFAULTS.pressureCoolDownMinutes * MIN,
      'Never cool the canner to hurry it',
      true,
    );
    const wait = plan.afterProcess.waitAfterZeroMinutes;
    add('rest', `Wait ${wait} min, then open the lid away from you`, wait * MIN, plan.afterProcess.text);
  } else if (plan.afterProcess.method === 'boiling-water') {
    slot.processStartAt = at;
    add('process', `Process ${plan.minutes} min at a rolling boil`, plan.minutes * MIN, plan.timing.text);
    slot.processEndAt = at;
    const rest = plan.afterProcess.restMinutes;
    add('rest', `Heat off, lid off: rest ${rest} min`, rest * MIN, plan.afterProcess.text);
  }
  add('lift', `Lift load ${number} out upright`, 0, 'Set the jars 1 inch apart to cool undisturbed 12 to 24 hours');
  return { steps, liftAt: at };
}

/**
 * The day's timeline: prep at one counter in batch order, one filling station, and each load into whichever
 * suitable canner can take it first. A canner's water goes on one come-up before its first load's lid, so it is
 * hot when the jars are filled, and never before the day starts.
 */
export function dayTimeline(input: TimelineInput): { steps: PlannedStep[]; loads: LoadSlot[]; heatingStartAt: number } {
  const steps: Step[] = [];
  const loads: LoadSlot[] = [];
  const cannerFree = new Map<string, number>();
  let prepAt = input.startAt;
  let fillFree = input.startAt;
  input.batches.forEach((b, batchIndex) => {
    const prep = prepSteps(b, batchIndex, prepAt, input.untimedStepMs);
    steps.push(...prep);
    const prepStart = prepAt;
    const ready = prep.at(-1)?.endAt ?? prepAt;
    prepAt = ready;
    let remaining = b.jars;
    let firstFill: number | null = null;
    const fits = input.fits[batchIndex] ?? [];
    while (remaining > 0 && fits.length > 0) {
      const options = fits.map((f) => {
        const canner = input.canners.find((c) => c.id === f.cannerId);
        const comeUpMs = canner?.comeUpMs ?? 0;
        const free = cannerFree.get(f.cannerId) ?? input.startAt + comeUpMs;
        return { ...f, comeUpMs, lidOnAt: Math.max(ready + input.fillMs, fillFree + input.fillMs, free) };
      });
      const pick = options.reduce((best, o) => (o.lidOnAt < best.lidOnAt ? o : best));
      const jars = Math.min(remaining, pick.plan.jarsPerLoad);
      const number = loads.length + 1;
      if (!cannerFree.has(pick.cannerId)) {
        steps.push({
          ...none,
          kind: 'heat-water',
          label: 'Start heating the canner water',
          station: 'canner',
          cannerId: pick.cannerId,
          startAt: pick.lidOnAt - pick.comeUpMs,
          endAt: pick.lidOnAt,
          detail: pick.plan.water
            ? `Up to ${pick.plan.water.preheatF} °F, with water to cover the jars by 1 inch`
            : null,
        });
      }
      const slot: LoadSlot = {
        batchIndex,
        cannerId: pick.cannerId,
        jars,
        plan: pick.plan,
        fillAt: pick.lidOnAt - input.fillMs,
        lidOnAt: pick.lidOnAt,
        processStartAt: 0,
        processEndAt: 0,
        liftAt: 0,
      };
      firstFill ??= slot.fillAt;
      steps.push({
        ...none,
        kind: 'fill',
        label: `Fill load ${number}: ${jars} jars`,
        station: 'fill',
        batchIndex,
        loadNumber: number,
        startAt: slot.fillAt,
        endAt: slot.lidOnAt,
        estimated: true,
        detail: `Headspace ${pick.plan.headspace.label}; free bubbles, wipe rims, lids and bands fingertip-tight`,
      });
      const canner = cannerSteps(slot, number, pick.comeUpMs);
      slot.liftAt = canner.liftAt;
      steps.push(...canner.steps);
      loads.push(slot);
      cannerFree.set(pick.cannerId, canner.liftAt);
      fillFree = slot.lidOnAt;
      remaining -= jars;
    }
    const jarPrep = fits[0]?.plan.jarPreparation;
    if (jarPrep && firstFill !== null) {
      steps.push({
        ...none,
        kind: 'warm-jars',
        label: jarPrep.sterilise ? `Sterilise jars ${jarPrep.minutes} min` : 'Warm the jars',
        detail: jarPrep.text,
        station: 'jars',
        batchIndex,
        startAt: prepStart,
        endAt: firstFill,
      });
    }
  });
  const lastLift = Math.max(...loads.map((l) => l.liftAt));
  steps.push({
    ...none,
    kind: 'bands-off',
    label: 'Bands may come off (12 h after the last lift)',
    station: 'prep',
    startAt: lastLift + 12 * 60 * MIN,
    endAt: lastLift + 12 * 60 * MIN,
    detail: '24 hours is recommended',
  });
  const heatingStartAt = Math.min(...steps.filter((s) => s.kind === 'heat-water').map((s) => s.startAt));
  const ordered = steps
    .map((s, i) => ({ s, i }))
    .sort((a, b) => a.s.startAt - b.s.startAt || a.i - b.i)
    .map(({ s }) => ({ ...s, startAt: new Date(s.startAt), endAt: new Date(s.endAt) }));
  return { steps: ordered, loads, heatingStartAt };
}
