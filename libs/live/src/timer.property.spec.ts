import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { applyTimerCommand } from './apply.js';
import type { TimerCommand, TimerResult } from './commands.js';
import { PRESSURE_OPENING_WAIT_MS, PRESSURE_VENT_MS, SECOND_MS } from './constants.js';
import { settle, remainingMs } from './schedule.js';
import { ctx, LEAD, make, MIN, T0 } from './testing/fixtures.js';
import { TIMER_KINDS, timerSchema, type LiveRole, type Timer, type TimerKind } from './timer.js';

const roleArb = fc.constantFrom<LiveRole>('lead', 'helper', 'helper', 'helper', 'watcher');
const reasonArb = fc.constantFrom('Load re-run after a power cut', 'Tested at the extension office');
const verb = (...types: TimerCommand['type'][]) => types.map((type) => ({ type }) as TimerCommand);
const addTimeArb = fc.record({
  type: fc.constant('add-time' as const),
  addMs: fc.integer({ min: SECOND_MS, max: 30 * MIN }),
});
const setDurationArb = fc.record(
  {
    type: fc.constant('set-duration' as const),
    durationMs: fc.integer({ min: MIN, max: 120 * MIN }),
    override: fc.record({ reason: reasonArb }),
  },
  { requiredKeys: ['type', 'durationMs'] },
);
/** Any command at all, the wrong ones for the kind included. */
const commandArb: fc.Arbitrary<TimerCommand> = fc.oneof(
  fc.constantFrom(
    ...verb('start', 'pause', 'resume', 'cancel', 'water-heating', 'rolling-boil', 'boil-lost', 'start-venting'),
    ...verb('at-pressure', 'pressure-lost', 'heat-off', 'gauge-zero', 'acknowledge'),
  ),
  addTimeArb,
  setDurationArb,
);
/** The verbs that move each kind along, so random days reach every state rather than dying early. */
function kindCommandArb(kind: TimerKind): fc.Arbitrary<TimerCommand> {
  const often = (verbs: TimerCommand[], rarely: fc.Arbitrary<TimerCommand>) =>
    fc.oneof({ weight: 6, arbitrary: fc.constantFrom(...verbs) }, { weight: 1, arbitrary: rarely });
  if (kind === 'process') {
    return often(verb('water-heating', 'rolling-boil', 'boil-lost', 'acknowledge'), setDurationArb);
  }
  if (kind === 'pressure-process') {
    const steps = verb('start-venting', 'at-pressure', 'pressure-lost', 'heat-off', 'gauge-zero', 'acknowledge');
    return often(steps, setDurationArb);
  }
  return often(verb('start', 'pause', 'resume', 'acknowledge'), addTimeArb);
}
/** One step of a day: time passes, then a person commands or the server's timeout fires. */
const stepArb = (kind: TimerKind) =>
  fc.record({
    dt: fc.oneof(fc.integer({ min: 0, max: 2 * MIN }), fc.integer({ min: 0, max: 40 * MIN })),
    role: roleArb,
    action: fc.oneof(
      { weight: 6, arbitrary: kindCommandArb(kind) },
      { weight: 1, arbitrary: commandArb },
      { weight: 2, arbitrary: fc.constant('fire' as const) },
    ),
  });
const timerArb = fc
  .record({
    // Processes have the most states to reach, so they get most of the runs.
    kind: fc.oneof(
      { weight: 3, arbitrary: fc.constantFrom<TimerKind>('process', 'pressure-process') },
      { weight: 1, arbitrary: fc.constantFrom(...TIMER_KINDS) },
    ),
    minutes: fc.integer({ min: 1, max: 120 }),
  })
  .map(({ kind, minutes }) =>
    kind === 'process' || kind === 'pressure-process'
      ? make({ kind, label: 'Load', testedMs: minutes * MIN })
      : make({ kind, label: 'Timer', durationMs: kind.endsWith('rest') ? undefined : minutes * MIN }),
  );

type Step = { dt: number; role: LiveRole; action: TimerCommand | 'fire' };
interface Trace {
  before: Timer;
  after: Timer;
  now: number;
  step: Step;
  /** The command's answer; null when the step was the server's timeout firing. */
  result: TimerResult | null;
}

/** Run a day the way the server does, recording each step. */
function simulate(start: Timer, steps: Step[], from = T0): Trace[] {
  const trace: Trace[] = [];
  let timer = start;
  let now = from;
  for (const step of steps) {
    now += step.dt;
    const before = timer;
    let result: TimerResult | null = null;
    if (step.action === 'fire') timer = settle(timer, now).timer;
    else {
      result = applyTimerCommand(timer, step.action, ctx(now, step.role));
      if (result.ok) timer = result.timer;
    }
    trace.push({ before, after: timer, now, step, result });
  }
  return trace;
}

const daysArb = (maxLength: number) =>
  timerArb.chain((t) => fc.tuple(fc.constant(t), fc.array(stepArb(t.kind), { minLength: 1, maxLength, size: 'max' })));
const dayArb = daysArb(40);
const RUNS = { numRuns: 300 };
const isProcess = (t: Timer) => t.kind === 'process' || t.kind === 'pressure-process';

describe('properties of any day', () => {
  it('a process that enters running has its full time ahead, counted from that moment', () => {
    fc.assert(
      fc.property(dayArb, ([start, steps]) => {
        for (const { before, after, now } of simulate(start, steps)) {
          if (!isProcess(after) || after.state !== 'running') continue;
          // Running always means: deadline = the moment timing started + the whole process time.
          expect(after.deadlineAt).toBe((after.phaseStartedAt ?? Number.NaN) + after.durationMs);
          if (before.state !== 'running') expect(after.deadlineAt! - now).toBe(after.durationMs);
        }
      }),
      RUNS,
    );
  });

  it('right after a boil or pressure loss the full time is back, and nothing counts', () => {
    fc.assert(
      fc.property(dayArb, ([start, steps]) => {
        for (const { after, now, result } of simulate(start, steps)) {
          const lost = result?.ok && result.events.some((e) => e.type.endsWith('-lost'));
          if (!lost) continue;
          expect(after.state).toBe(after.kind === 'process' ? 'waiting-for-boil' : 'coming-up');
          expect(after.deadlineAt).toBeNull();
          expect(remainingMs(after, now)).toBe(after.durationMs);
        }
      }),
      RUNS,
    );
  });

  it('remaining time is never negative nor longer than the phase it belongs to', () => {
    fc.assert(
      fc.property(dayArb, fc.integer({ min: 0, max: 200 * MIN }), ([start, steps], later) => {
        for (const { after, now } of simulate(start, steps)) {
          const longest = Math.max(after.durationMs, PRESSURE_VENT_MS, PRESSURE_OPENING_WAIT_MS);
          for (const at of [now, now + later]) {
            expect(remainingMs(after, at)).toBeGreaterThanOrEqual(0);
            expect(remainingMs(after, at)).toBeLessThanOrEqual(longest);
          }
        }
      }),
      RUNS,
    );
  });

  it('every timer stays a valid stored timer, and only a lead override goes below the minimum', () => {
    fc.assert(
      fc.property(dayArb, ([start, steps]) => {
        for (const { after } of simulate(start, steps)) {
          expect(timerSchema.safeParse(after).success).toBe(true);
          if (after.minimumMs !== null && after.durationMs < after.minimumMs) {
            expect(after.overrides.some((o) => o.durationMs === after.durationMs && o.byUserId === LEAD)).toBe(true);
          }
        }
      }),
      RUNS,
    );
  });

  it('watchers change nothing; a change steps the version once; a no-op keeps it', () => {
    fc.assert(
      fc.property(dayArb, ([start, steps]) => {
        for (const { before, after, step, result } of simulate(start, steps)) {
          if (result === null) continue;
          if (step.role === 'watcher') expect(result).toMatchObject({ ok: false, error: { code: 'forbidden' } });
          if (!result.ok) expect(after).toBe(before);
          else expect(after.version).toBe(before.version + (result.events.length > 0 ? 1 : 0));
          if (result.ok && result.events.length > 0) {
            expect(result.events[0]?.from).toBe(before.state);
            expect(result.events.at(-1)?.to).toBe(after.state);
          }
        }
      }),
      RUNS,
    );
  });

  it('the same command twice at the same moment acts once (all verbs but "add time")', () => {
    fc.assert(
      fc.property(dayArb, commandArb, ([start, steps], command) => {
        fc.pre(command.type !== 'add-time');
        const last = simulate(start, steps).at(-1);
        const timer = last?.after ?? start;
        const now = (last?.now ?? T0) + MIN;
        const first = applyTimerCommand(timer, command, ctx(now, 'lead'));
        if (!first.ok) return;
        expect(applyTimerCommand(first.timer, command, ctx(now, 'lead'))).toEqual({
          ok: true,
          timer: first.timer,
          events: [],
          noop: true,
        });
      }),
      RUNS,
    );
  });

  it('a timer read back from JSON behaves exactly like the original', () => {
    fc.assert(
      fc.property(daysArb(45), fc.nat(45), ([start, day], cut) => {
        const [steps, rest] = [day.slice(0, cut), day.slice(cut)];
        const last = simulate(start, steps).at(-1);
        const [timer, now] = [last?.after ?? start, last?.now ?? T0];
        const copy = JSON.parse(JSON.stringify(timer)) as Timer;
        expect(copy).toStrictEqual(timer);
        expect(simulate(copy, rest, now)).toStrictEqual(simulate(timer, rest, now));
      }),
      RUNS,
    );
  });
});
