import { CANNER_REST_MS, MINUTE_MS, PRESSURE_OPENING_WAIT_MS, PRESSURE_VENT_MS } from '@jarday/live';
import { describe, expect, it } from 'vitest';
import { fired, jamPlan, load, LOAD_ID, move, processTimer, T0, timer } from '../testing/day-fixtures';
import { loadPhase } from './load-phase';
import { loadActions, simpleActions, type BoardAction } from './timer-actions';

const labels = (actions: BoardAction[]) => actions.map((a) => a.label);
const only = (actions: BoardAction[]) => {
  expect(actions).toHaveLength(1);
  return actions[0]!;
};

describe('the canner’s one button, by the state of its load (boiling water)', () => {
  const jam = load();
  const armed = processTimer();
  const heating = move(armed, { type: 'water-heating' }, T0 + MINUTE_MS);
  const running = move(heating, { type: 'rolling-boil' }, T0 + 20 * MINUTE_MS);
  const done = fired(running);

  it('armed: "Water heating, lid on"', () => {
    expect(only(loadActions(jam, { process: armed, rest: null, cooling: null }))).toMatchObject({
      label: 'Water heating, lid on',
      tone: 'go',
      command: { type: 'water-heating' },
    });
    expect(loadPhase(jam, { process: armed, rest: null, cooling: null })).toMatchObject({
      phase: 'filling',
      shape: 'open-circle',
    });
  });

  it('waiting for the boil: a big "Rolling boil"', () => {
    expect(only(loadActions(jam, { process: heating, rest: null, cooling: null }))).toMatchObject({
      label: 'Rolling boil',
      command: { type: 'rolling-boil' },
    });
    expect(loadPhase(jam, { process: heating, rest: null, cooling: null }).title).toBe(
      'Heating: waiting for a rolling boil',
    );
  });

  it('processing: a big "Boil lost", marked as a stop', () => {
    expect(only(loadActions(jam, { process: running, rest: null, cooling: null }))).toMatchObject({
      label: 'Boil lost',
      tone: 'stop',
      command: { type: 'boil-lost' },
    });
  });

  it('time up: "Heat off, lid off" answers the alarm and starts the 5-minute rest for this load', () => {
    const action = only(loadActions(jam, { process: done, rest: null, cooling: null }));
    expect(action).toMatchObject({
      kind: 'start',
      label: 'Heat off, lid off',
      acknowledge: [done.id],
      timer: { kind: 'canner-rest', loadId: LOAD_ID, startNow: true },
    });
  });

  it('resting: no button while the 5 minutes count; then "Lift jars out upright" starts the cooling shelf', () => {
    const rest = timer(
      { kind: 'canner-rest', label: 'Load 1: rest', loadId: LOAD_ID, startNow: true },
      T0 + 31 * MINUTE_MS,
    );
    const acked = move(done, { type: 'acknowledge' }, T0 + 31 * MINUTE_MS);
    expect(loadActions(jam, { process: acked, rest, cooling: null })).toEqual([]);
    expect(rest.deadlineAt! - rest.phaseStartedAt!).toBe(CANNER_REST_MS);
    const restDone = fired(rest);
    const lift = only(loadActions(jam, { process: acked, rest: restDone, cooling: null }));
    expect(lift).toMatchObject({
      label: 'Lift jars out upright',
      acknowledge: [restDone.id],
      timer: { kind: 'cooling-rest', loadId: LOAD_ID },
    });
    const cooling = timer({ kind: 'cooling-rest', label: 'Load 1: cooling', loadId: LOAD_ID, startNow: true });
    expect(loadActions(jam, { process: acked, rest: restDone, cooling })).toEqual([]);
    expect(loadPhase(jam, { process: acked, rest: restDone, cooling }).phase).toBe('cooling');
  });
});

describe('the pressure canner’s buttons', () => {
  const beans = load({ method: 'pressure', plan: jamPlan('pressure') });
  const armed = timer({
    kind: 'pressure-process',
    label: 'Load 1: pressure',
    testedMs: 20 * MINUTE_MS,
    loadId: LOAD_ID,
  });
  const of = (process: typeof armed) => labels(loadActions(beans, { process, rest: null, cooling: null }));

  it('goes venting, at pressure, pressure lost, heat off, gauge at zero, lift', () => {
    expect(of(armed)).toEqual(['Start venting']);
    const venting = move(armed, { type: 'start-venting' }, T0);
    expect(venting.deadlineAt).toBe(T0 + PRESSURE_VENT_MS);
    expect(of(venting)).toEqual([]);
    const comingUp = fired(venting);
    expect(of(comingUp)).toEqual(['At pressure']);
    // Reaching pressure answers the "vented" alarm too: the person is at the canner.
    expect(loadActions(beans, { process: comingUp, rest: null, cooling: null })[0]?.acknowledge).toEqual([comingUp.id]);
    const running = move(comingUp, { type: 'at-pressure' }, T0 + 15 * MINUTE_MS);
    expect(of(running)).toEqual(['Pressure lost']);
    const done = fired(running);
    expect(of(done)).toEqual(['Heat off']);
    // The board acknowledges the alarms a tap answers before sending it.
    expect(loadActions(beans, { process: done, rest: null, cooling: null })[0]?.acknowledge).toEqual([done.id]);
    const acked = move(done, { type: 'acknowledge' }, T0 + 40 * MINUTE_MS);
    const cooling = move(acked, { type: 'heat-off' }, T0 + 40 * MINUTE_MS);
    expect(of(cooling)).toEqual(['Gauge at zero']);
    const waiting = move(cooling, { type: 'gauge-zero' }, T0 + 70 * MINUTE_MS);
    expect(waiting.deadlineAt).toBe(T0 + 70 * MINUTE_MS + PRESSURE_OPENING_WAIT_MS);
    expect(of(waiting)).toEqual([]);
    expect(of(fired(waiting))).toEqual(['Lift jars out upright']);
  });

  it('names the pressure to reach from the plan: 15 lb on a weighted gauge at 2,350 ft (USDA Guide 1)', () => {
    const comingUp = fired(move(armed, { type: 'start-venting' }, T0));
    expect(loadPhase(beans, { process: comingUp, rest: null, cooling: null }).next).toBe(
      'Close the vent. Tap At pressure when the 15 lb weight rocks.',
    );
  });
});

describe('simple timers', () => {
  const dip = timer({ kind: 'blanch', label: 'Blanch dip', durationMs: 45_000 });

  it('ready: start; running: pause, +1 min, cancel; paused: resume, +1 min, cancel', () => {
    expect(labels(simpleActions(dip))).toEqual(['Start', 'Cancel']);
    const running = move(dip, { type: 'start' }, T0);
    expect(labels(simpleActions(running))).toEqual(['Pause', '+1 min', 'Cancel']);
    expect(simpleActions(running)[1]).toMatchObject({ command: { type: 'add-time', addMs: MINUTE_MS } });
    expect(labels(simpleActions(move(running, { type: 'pause' }, T0 + 10_000)))).toEqual([
      'Resume',
      '+1 min',
      'Cancel',
    ]);
  });

  it('done with its alarm up: Acknowledge; once acknowledged, nothing', () => {
    const rang = fired(move(dip, { type: 'start' }, T0));
    expect(simpleActions(rang)).toMatchObject([{ label: 'Acknowledge', command: { type: 'acknowledge' } }]);
    expect(simpleActions(move(rang, { type: 'acknowledge' }, T0 + 50_000))).toEqual([]);
  });

  it('a rest cannot be paused or stretched: only cancelled', () => {
    const rest = timer({ kind: 'canner-rest', label: 'Rest', loadId: LOAD_ID, startNow: true });
    expect(labels(simpleActions(rest))).toEqual(['Cancel']);
  });
});
