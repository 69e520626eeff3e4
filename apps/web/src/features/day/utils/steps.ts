import type { BatchView, LoadView, PrepStep, StepKey, TimerState } from '@jarday/contracts';
import { KEEP_JARS_HOT_F, type CautionId, type ProcessPlan } from '@jarday/rules';
import type { LoadTimers } from './timer-actions';

/** The pressure canner's own stages, which its timer alone moves through (no tick of their own). */
export type PressureStage = 'vent' | 'come-up' | 'gauge-zero' | 'open-wait';

/**
 * A step of the guide. `local` steps are ticked with "Next step" (`step:confirm`, so every device and the journal
 * see it); `timer` steps are done when the load's timers have moved past them.
 */
export interface GuideStep {
  id: StepKey | PressureStage;
  title: string;
  detail: string;
  source: 'local' | 'timer';
  caution?: CautionId;
  /** The filling step draws the recipe's headspace to scale. */
  picture?: 'headspace';
}

const local = (id: StepKey, title: string, detail: string, extra: Partial<GuideStep> = {}): GuideStep => ({
  id,
  title,
  detail,
  source: 'local',
  ...extra,
});
const timed = (id: StepKey | PressureStage, title: string, detail: string, caution?: CautionId): GuideStep => ({
  id,
  title,
  detail,
  source: 'timer',
  ...(caution ? { caution } : {}),
});

/** From filling the jars to the cooling shelf, for one load and its plan (USDA Complete Guide, Guide 1). */
export function loadSteps({ plan }: Pick<LoadView, 'plan'>): GuideStep[] {
  const fill: GuideStep[] = [
    local('fill', 'Fill the hot jars', 'Ladle or pack the hot food into the hot jars.', { caution: 'hot-jars-steam' }),
    local('headspace', `Leave ${plan.headspace.label} headspace`, 'Match the gap under the rim to the picture.', {
      picture: 'headspace',
    }),
    local(
      'free-bubbles',
      'Free the air bubbles',
      'Run a thin non-metal spatula around the inside; top up to the headspace.',
    ),
    local('wipe-rims', 'Wipe the rims', 'Wipe each rim and thread with a clean damp cloth.'),
    local('lids-bands', 'Lids on, bands fingertip-tight', 'Centre the lid; turn the band until it stops, no tighter.'),
  ];
  const after: GuideStep[] = [
    timed(
      'lift-jars',
      'Lift the jars out upright',
      'Straight up and out with a jar lifter; do not tilt them.',
      'hot-jars-steam',
    ),
    timed(
      'cooling-shelf',
      'Cooling shelf',
      'Set jars 1 inch apart; do not retighten the bands; leave 12 to 24 hours.',
      'suspect-jars',
    ),
  ];
  if (plan.method === 'pressure' && plan.pressure) {
    const reading = plan.pressure.gauge === 'dial' ? 'the dial reads' : 'the weight rocks at';
    return [
      ...fill,
      local(
        'water-over-jars',
        'Jars into the canner',
        'On the rack, with the water your canner’s instructions call for; lock the lid.',
        {
          caution: 'low-acid-pressure',
        },
      ),
      timed(
        'vent',
        `Vent ${plan.ventMinutes ?? 10} minutes`,
        'Steam flows steadily from the open vent the whole time.',
      ),
      timed(
        'come-up',
        `Come up to ${plan.pressure.pounds} lb`,
        `Close the vent; the time starts when ${reading} ${plan.pressure.pounds} lb.`,
        plan.pressure.gauge === 'dial' ? 'dial-gauge-check' : undefined,
      ),
      timed(
        'process',
        `Process ${plan.minutes} min at pressure`,
        `Timed for ${plan.altitudeFt.toLocaleString('en-US')} ft. Pressure lost: the full time again.`,
        'altitude',
      ),
      timed('heat-off-lid-off', 'Heat off', 'Let the pressure fall to zero by itself; never cool the canner.'),
      timed('gauge-zero', 'Gauge at zero', 'Tap Gauge at zero when it reads zero of its own accord.'),
      timed('open-wait', 'Wait 10 minutes', 'Then open the lid tilted away from your face.', 'hot-jars-steam'),
      ...after,
    ];
  }
  const water = plan.water;
  return [
    ...fill,
    local(
      'water-over-jars',
      'Water 1 inch over the jars',
      `On the rack, water at least ${water?.overJarsInches ?? 1} inch over the tops (preheated to about ${water?.preheatF ?? 180} °F).`,
    ),
    timed(
      'wait-for-boil',
      'Heat to a rolling boil',
      'Lid on, high heat. Tap Rolling boil only when it boils hard and steadily.',
    ),
    timed(
      'process',
      `Process ${plan.minutes} min`,
      `Timed for ${plan.altitudeFt.toLocaleString('en-US')} ft, from the rolling boil. Boil lost: the full time again.`,
      'altitude',
    ),
    timed(
      'heat-off-lid-off',
      'Heat off, lid off',
      'Turn off the heat and take the lid off, away from your face.',
      'hot-jars-steam',
    ),
    timed('rest', 'Rest 5 minutes', 'The jars stand in the open canner before they come out.'),
    ...after,
  ];
}

const PROCESS_ORDER: Record<string, TimerState[]> = {
  process: ['armed', 'waiting-for-boil', 'running', 'done'],
  'pressure-process': ['armed', 'venting', 'coming-up', 'running', 'done', 'cooling-down', 'opening-wait', 'finished'],
};
/** The process state a timer step is finished by: reaching it or any later one. */
const FINISHED_BY: Partial<Record<GuideStep['id'], TimerState>> = {
  'wait-for-boil': 'running',
  vent: 'coming-up',
  'come-up': 'running',
  'gauge-zero': 'opening-wait',
  'open-wait': 'finished',
};

/** Whether a timer step is behind the load: read from the process, the rest and the cooling timers. */
export function timerStepDone(stepId: GuideStep['id'], { process, rest, cooling }: LoadTimers): boolean {
  if (cooling) return stepId !== 'cooling-shelf' || cooling.state === 'done';
  if (!process) return false;
  const order = PROCESS_ORDER[process.kind] ?? [];
  const at = order.indexOf(process.state);
  const reached = (state: TimerState) => at >= 0 && at >= order.indexOf(state);
  const pressure = process.kind === 'pressure-process';
  switch (stepId) {
    case 'process':
      return reached('done');
    case 'heat-off-lid-off':
      return pressure ? reached('cooling-down') : rest !== null;
    case 'rest':
      return rest?.state === 'done';
    default: {
      const by = FINISHED_BY[stepId];
      return by ? reached(by) : false;
    }
  }
}

const labelsOf = (steps: readonly PrepStep[], kinds: PrepStep['kind'][]) =>
  steps.filter((p) => kinds.includes(p.kind)).map((p) => p.label);

/**
 * The batch's prep in the guide's four steps (blanching, peeling, the simmer, warm jars), worded from the recipe's own
 * prep steps when they are known. A step the recipe does not have is left out; without the recipe, all four show.
 */
export function batchSteps(
  batch: Pick<BatchView, 'recipeName'>,
  prepSteps: readonly PrepStep[] | undefined,
  plan: ProcessPlan | undefined,
): GuideStep[] {
  const known = prepSteps !== undefined && prepSteps.length > 0;
  const has = (...kinds: PrepStep['kind'][]) => !known || prepSteps.some((p) => kinds.includes(p.kind));
  const own = (kinds: PrepStep['kind'][], fallback: string) =>
    (known ? labelsOf(prepSteps, kinds).join(' ') : '') || fallback;
  const steps: GuideStep[] = [];
  if (has('blanch')) steps.push(local('blanch', 'Blanch', own(['blanch'], PREP_HINTS.blanch)));
  if (has('blanch', 'peel', 'chop', 'other')) {
    steps.push(local('peel', 'Peel and prepare', own(['peel', 'chop', 'other'], PREP_HINTS.peel)));
  }
  if (has('simmer')) {
    steps.push(
      local('simmer', `Cook the ${batch.recipeName.toLowerCase()}`, own(['simmer'], PREP_HINTS.simmer), {
        caution: 'tested-recipes',
      }),
    );
  }
  const jars =
    plan?.jarPreparation.text ??
    own(['hot-hold'], `Keep clean jars hot in simmering water (about ${KEEP_JARS_HOT_F} °F) until you fill them.`);
  steps.push(local('warm-jars', 'Warm the jars', jars, { caution: 'no-oven' }));
  return steps;
}

/** Blanching tomatoes for peeling: 30 to 60 seconds in boiling water, then cold water (USDA Complete Guide, Guide 3). */
const PREP_HINTS = {
  blanch: 'Dip in boiling water 30 to 60 seconds, or until the skins split, then into cold water.',
  peel: 'Slip the skins off; trim, core and cut as the recipe says.',
  simmer: 'Exactly as the tested recipe says; stir so nothing catches.',
};
