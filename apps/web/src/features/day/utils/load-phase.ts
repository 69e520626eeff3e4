import type { LoadView, Timer } from '@jarday/contracts';
import type { LoadTimers } from './timer-actions';

/** Where a canner load stands, read from its timers (the server's), never kept on the device. */
export type LoadPhase =
  | 'filling'
  | 'heating'
  | 'venting'
  | 'coming-up'
  | 'processing'
  | 'time-up'
  | 'cooling-down'
  | 'opening-wait'
  | 'resting'
  | 'lift'
  | 'cooling'
  | 'cancelled';

/** The shape that goes with a phase's text and colour, so no one has to tell colours apart. */
export type PhaseShape = 'open-circle' | 'hourglass' | 'play' | 'bell' | 'square' | 'check' | 'cross';
export type PhaseTone = 'idle' | 'waiting' | 'counting' | 'attention' | 'finished';

export interface PhaseView {
  phase: LoadPhase;
  title: string;
  /** What to do now, in a sentence. */
  next: string;
  shape: PhaseShape;
  tone: PhaseTone;
  /** The timer whose clock the station shows. */
  clock: Timer | null;
}

/** Indexes the day's timers by load: its process, its rest in the open canner, its cooling shelf. */
export function timersOfLoad(loadId: string, timers: readonly Timer[]): LoadTimers {
  const of = (kind: Timer['kind'][]) =>
    timers.filter((t) => t.loadId === loadId && kind.includes(t.kind) && t.state !== 'cancelled').at(-1) ?? null;
  return { process: of(['process', 'pressure-process']), rest: of(['canner-rest']), cooling: of(['cooling-rest']) };
}

/** The state of a load in words, shape and tone, with the clock to show. */
export function loadPhase(load: LoadView, { process, rest, cooling }: LoadTimers): PhaseView {
  const view = (phase: LoadPhase, title: string, next: string, shape: PhaseShape, tone: PhaseTone, clock = process) =>
    ({ phase, title, next, shape, tone, clock }) satisfies PhaseView;
  const minutes = `${load.plan.minutes} min`;
  if (cooling) {
    return view(
      'cooling',
      'Lifted: cooling',
      'Undisturbed on the cooling shelf, 12 to 24 hours.',
      'check',
      'finished',
      cooling,
    );
  }
  if (!process || process.state === 'cancelled') {
    return view('cancelled', 'No process timer', 'This load has no running process.', 'cross', 'idle', null);
  }
  const pressure = load.plan.pressure;
  const reading = pressure
    ? pressure.gauge === 'dial'
      ? `the dial reads ${pressure.pounds} lb`
      : `the ${pressure.pounds} lb weight rocks`
    : '';
  switch (process.state) {
    case 'armed':
      return process.kind === 'pressure-process'
        ? view(
            'filling',
            'Filling',
            'Fill the jars, lock the lid, heat until steam flows from the open vent.',
            'open-circle',
            'idle',
          )
        : view(
            'filling',
            'Filling',
            'Fill the jars, set them in the canner, heat the water with the lid on.',
            'open-circle',
            'idle',
          );
    case 'waiting-for-boil':
      return view(
        'heating',
        'Heating: waiting for a rolling boil',
        `Tap Rolling boil when the water boils hard and keeps boiling. The ${minutes} start then.`,
        'hourglass',
        'waiting',
      );
    case 'venting':
      return view('venting', 'Venting', 'Let steam flow from the open vent the full 10 minutes.', 'play', 'counting');
    case 'coming-up':
      return view(
        'coming-up',
        'Coming up to pressure',
        `Close the vent. Tap At pressure when ${reading}.`,
        'hourglass',
        'waiting',
      );
    case 'running':
      return process.kind === 'pressure-process'
        ? view(
            'processing',
            'Processing at pressure',
            `Hold ${pressure?.pounds ?? ''} lb. If it falls below, tap Pressure lost: the full time starts again.`,
            'play',
            'counting',
          )
        : view(
            'processing',
            'Processing',
            'Keep a steady boil. If it stops, tap Boil lost: the full time starts again.',
            'play',
            'counting',
          );
    case 'done':
      if (process.kind === 'pressure-process') {
        return view(
          'time-up',
          'Time is up',
          'Turn off the heat. Let the pressure fall to zero by itself.',
          'bell',
          'attention',
        );
      }
      if (!rest) return view('time-up', 'Time is up', 'Turn off the heat and take the lid off.', 'bell', 'attention');
      if (rest.state === 'done')
        return view(
          'lift',
          'Ready to lift',
          'Lift the jars straight up and out, keeping them upright.',
          'bell',
          'attention',
          rest,
        );
      return view(
        'resting',
        'Resting in the open canner',
        'Heat off, lid off: the jars stand 5 minutes.',
        'play',
        'counting',
        rest,
      );
    case 'cooling-down':
      return view(
        'cooling-down',
        'Cooling down',
        'Never cool the canner to hurry it. Tap Gauge at zero when it reads zero.',
        'hourglass',
        'waiting',
      );
    case 'opening-wait':
      return view(
        'opening-wait',
        'Waiting to open',
        'Wait 10 minutes, then open the lid tilted away from you.',
        'play',
        'counting',
      );
    case 'finished':
      return view(
        'lift',
        'Ready to lift',
        'Open the lid away from your face; lift the jars out upright.',
        'bell',
        'attention',
      );
    default:
      return view('cancelled', 'No process timer', 'This load has no running process.', 'cross', 'idle', null);
  }
}

/** The phase of a simple timer (blanch, simmer, hot-hold, rests) in the same vocabulary. */
export function simplePhase(timer: Timer): Pick<PhaseView, 'title' | 'shape' | 'tone'> {
  if (timer.alarm && timer.alarm.acknowledgedAt === undefined)
    return { title: 'Time is up', shape: 'bell', tone: 'attention' };
  switch (timer.state) {
    case 'ready':
      return { title: 'Ready', shape: 'open-circle', tone: 'idle' };
    case 'running':
      return { title: 'Counting down', shape: 'play', tone: 'counting' };
    case 'paused':
      return { title: 'Paused', shape: 'hourglass', tone: 'waiting' };
    case 'cancelled':
      return { title: 'Cancelled', shape: 'cross', tone: 'idle' };
    default:
      return { title: 'Done', shape: 'check', tone: 'finished' };
  }
}
