import type { LoadView, NewTimer, Timer, TimerCommand } from '@jarday/contracts';
import { ADJUSTABLE_KINDS, MINUTE_MS } from '@jarday/live';

/** How a button looks: `go` moves the work on, `stop` reports a problem (a lost boil), `plain` is secondary. */
export type ActionTone = 'go' | 'stop' | 'plain';

interface ActionBase {
  /** Stable per button, for keys and tests. */
  id: string;
  label: string;
  /** The button's whole name when its words are short ("45 s" is "Blanch dip 45 s"). */
  spoken?: string;
  tone: ActionTone;
  /** Alarms this tap answers: the person is at the canner, so their tap silences these first. */
  acknowledge: string[];
}
export type BoardAction =
  | (ActionBase & { kind: 'command'; timerId: string; command: TimerCommand })
  | (ActionBase & { kind: 'start'; timer: NewTimer });

/** The load's timers, as the board finds them by `loadId`. */
export interface LoadTimers {
  process: Timer | null;
  rest: Timer | null;
  cooling: Timer | null;
}

export const alarmIsOn = (t: Timer | null | undefined): t is Timer =>
  Boolean(t?.alarm && t.alarm.acknowledgedAt === undefined);

const command = (
  timer: Timer,
  id: string,
  label: string,
  tone: ActionTone,
  cmd: TimerCommand,
  acknowledge: string[] = [],
): BoardAction => ({ kind: 'command', id, label, tone, timerId: timer.id, command: cmd, acknowledge });

/** The acknowledge button for a timer whose alarm is sounding, or nothing. */
export function acknowledgeAction(timer: Timer): BoardAction[] {
  return alarmIsOn(timer) ? [command(timer, 'acknowledge', 'Acknowledge', 'go', { type: 'acknowledge' })] : [];
}

/** Blanch, simmer, hot-hold and custom timers: start, pause, resume, a minute more, cancel; rests only start. */
export function simpleActions(timer: Timer): BoardAction[] {
  const adjustable = (ADJUSTABLE_KINDS as readonly string[]).includes(timer.kind);
  const more = command(timer, 'add-minute', '+1 min', 'plain', { type: 'add-time', addMs: MINUTE_MS });
  const cancel = command(timer, 'cancel', 'Cancel', 'plain', { type: 'cancel' });
  switch (timer.state) {
    case 'ready':
      return [command(timer, 'start', 'Start', 'go', { type: 'start' }), cancel];
    case 'running':
      return adjustable ? [command(timer, 'pause', 'Pause', 'plain', { type: 'pause' }), more, cancel] : [cancel];
    case 'paused':
      return [command(timer, 'resume', 'Resume', 'go', { type: 'resume' }), more, cancel];
    default:
      return acknowledgeAction(timer);
  }
}

const loadTimer = (load: LoadView, kind: 'canner-rest' | 'cooling-rest', label: string): NewTimer => ({
  kind,
  label: `Load ${load.number}: ${label}`,
  loadId: load.id,
  startNow: true,
});

/**
 * The one thing to do next at a canner, by the state of its load's timers: heat the water, confirm the boil, report
 * it lost; then heat off and lid off (which starts the 5-minute rest), and lifting the jars out (which puts the load
 * on the cooling shelf). Pressure canners: venting, at pressure, pressure lost, heat off, gauge at zero.
 */
export function loadActions(load: LoadView, { process, rest, cooling }: LoadTimers): BoardAction[] {
  if (!process || cooling) return [];
  const ringing = [process, rest].filter(alarmIsOn).map((t) => t.id);
  const lift = (): BoardAction[] => [
    {
      kind: 'start',
      id: 'lift',
      label: 'Lift jars out upright',
      tone: 'go',
      acknowledge: ringing,
      timer: loadTimer(load, 'cooling-rest', 'cooling shelf'),
    },
  ];
  if (process.kind === 'pressure-process') {
    switch (process.state) {
      case 'armed':
        return [command(process, 'start-venting', 'Start venting', 'go', { type: 'start-venting' })];
      case 'coming-up':
        return [command(process, 'at-pressure', 'At pressure', 'go', { type: 'at-pressure' }, ringing)];
      case 'running':
        return [command(process, 'pressure-lost', 'Pressure lost', 'stop', { type: 'pressure-lost' })];
      case 'done':
        return [command(process, 'heat-off', 'Heat off', 'go', { type: 'heat-off' }, ringing)];
      case 'cooling-down':
        return [command(process, 'gauge-zero', 'Gauge at zero', 'go', { type: 'gauge-zero' }, ringing)];
      case 'finished':
        return lift();
      default:
        return acknowledgeAction(process);
    }
  }
  switch (process.state) {
    case 'armed':
      return [command(process, 'water-heating', 'Water heating, lid on', 'go', { type: 'water-heating' })];
    case 'waiting-for-boil':
      return [command(process, 'rolling-boil', 'Rolling boil', 'go', { type: 'rolling-boil' })];
    case 'running':
      return [command(process, 'boil-lost', 'Boil lost', 'stop', { type: 'boil-lost' })];
    case 'done':
      if (!rest) {
        const timer = loadTimer(load, 'canner-rest', 'rest in the open canner');
        return [{ kind: 'start', id: 'heat-off', label: 'Heat off, lid off', tone: 'go', acknowledge: ringing, timer }];
      }
      return rest.state === 'done' ? lift() : acknowledgeAction(rest);
    default:
      return [];
  }
}
