import { describe, expect, it } from 'vitest';
import { applyTimerCommand } from './apply.js';
import type { TimerCommand, TimerResult } from './commands.js';
import { createTimer } from './create.js';
import { describeEntry, filterEntries, type JournalEntryLike, placeEntries, summariseDay } from './day-summary.js';
import { timelineLanes } from './day-summary-lanes.js';
import { fireDue } from './schedule.js';
import type { NewTimer, Timer } from './index.js';
import { DAY_ID, MIN, T0 } from './testing/fixtures.js';

const SEC = 1000;
const CANNER = '11111111-2222-4333-8444-555555555555';
const MAREN = { userId: 'u-maren', name: 'Maren' };
const TEO = { userId: 'u-teo', name: 'Teo' };

/** A hand-told day: each call appends the entries the server would write for it, numbered in order. */
function journal() {
  const entries: JournalEntryLike[] = [];
  const timers = new Map<string, Timer>();
  let n = 0;
  const push = (at: number, type: string, payload: unknown, actor: typeof MAREN | null) =>
    entries.push({
      seq: entries.length + 1,
      at: new Date(at).toISOString(),
      actor,
      deviceId: actor ? 'dev-1234' : null,
      type,
      payload,
    });
  const take = (r: TimerResult, actor: typeof MAREN | null) => {
    if (!r.ok) throw new Error(r.error.message);
    timers.set(r.timer.id, r.timer);
    for (const e of r.events)
      push(e.at, e.type, { timerId: e.timerId, from: e.from, to: e.to, detail: e.detail, timer: r.timer }, actor);
    return r.timer;
  };
  const api = {
    entries,
    load(number: number, at: number, jars: number, jarSize: string, minutes: number, lifted: number | null = null) {
      const id = `00000000-0000-4000-8000-00000000000${number}`;
      const load = {
        id,
        number,
        cannerId: CANNER,
        cannerName: 'Water bath',
        jars,
        plan: { recipeName: 'Jam', jarSize, minutes },
        liftedAt: lifted === null ? null : new Date(lifted).toISOString(),
      };
      push(at, lifted === null ? 'load.created' : 'load.lifted', { load }, TEO);
      return id;
    },
    timer(input: NewTimer, at: number, actor = TEO, role: 'lead' | 'helper' = 'helper') {
      n += 1;
      return take(
        createTimer(input, { now: at, actorRole: role, actorId: actor.userId, timerId: `t-${n}`, dayId: DAY_ID }),
        actor,
      );
    },
    cmd(t: Timer, command: TimerCommand, at: number, actor = TEO) {
      return take(
        applyTimerCommand(timers.get(t.id)!, command, { now: at, actorRole: 'helper', actorId: actor.userId }),
        actor,
      );
    },
    fire(t: Timer, at: number) {
      return take(fireDue(timers.get(t.id)!, at), null);
    },
    raw: push,
  };
  return api;
}

/** Load 1: 6 half-pints, 10 min; 30 min come-up, boil lost once, alarm answered 25 s after; lifted after the rest. */
function jamDay() {
  const j = journal();
  j.raw(T0, 'day.opened', { date: '2026-08-15', title: 'Jam day' }, MAREN);
  const load1 = j.load(1, T0 + MIN, 6, 'half-pint', 10);
  const p1 = j.timer({ kind: 'process', label: 'Load 1: Jam', testedMs: 10 * MIN, loadId: load1 }, T0 + MIN);
  j.cmd(p1, { type: 'water-heating' }, T0 + 5 * MIN);
  j.cmd(p1, { type: 'rolling-boil' }, T0 + 35 * MIN);
  j.cmd(p1, { type: 'boil-lost' }, T0 + 38 * MIN);
  j.cmd(p1, { type: 'rolling-boil' }, T0 + 41 * MIN);
  j.fire(p1, T0 + 51 * MIN);
  j.cmd(p1, { type: 'acknowledge' }, T0 + 51 * MIN + 25 * SEC, MAREN);
  const rest = j.timer(
    {
      kind: 'canner-rest',
      label: 'Load 1: rest',
      loadId: load1,
      startNow: true,
      durationMs: 2 * MIN,
      override: { reason: 'Pan on fire, needed the burner' },
    },
    T0 + 52 * MIN,
    MAREN,
    'lead',
  );
  j.fire(rest, T0 + 54 * MIN);
  const load2 = j.load(2, T0 + 55 * MIN, 4, 'pint', 10);
  j.timer({ kind: 'process', label: 'Load 2: Jam', testedMs: 10 * MIN, loadId: load2 }, T0 + 55 * MIN);
  j.cmd(rest, { type: 'acknowledge' }, T0 + 56 * MIN + 10 * SEC);
  j.load(1, T0 + 57 * MIN, 6, 'half-pint', 10, T0 + 57 * MIN);
  j.timer({ kind: 'cooling-rest', label: 'Load 1: cooling shelf', loadId: load1, startNow: true }, T0 + 57 * MIN);
  j.timer({ kind: 'blanch', label: 'Blanch dip', durationMs: 45 * SEC, startNow: true }, T0 + 58 * MIN);
  return { j, load1, load2 };
}

describe('summariseDay', () => {
  it('counts processed loads and their jars, come-up, boil losses and each alarm ring (ack - raised)', () => {
    const { j } = jamDay();
    const s = summariseDay(j.entries, { sealResults: ['sealed', 'sealed', 'unsealed', 'sealed'] });
    expect(s.loadsProcessed).toBe(1);
    expect(s.loads.map((l) => l.number)).toEqual([1, 2]);
    expect(s.jarsBySize).toEqual([{ jarSize: 'half-pint', jars: 6, loads: 1 }]);
    expect(s.jarsProcessed).toBe(6);
    expect(s.loads[0]).toMatchObject({
      comeUpMs: 30 * MIN,
      boilLosses: 1,
      processedAt: T0 + 51 * MIN,
      liftedAt: T0 + 57 * MIN,
    });
    expect(s.boilLosses).toBe(1);
    expect(s.alarms.map((a) => [a.label, a.ringMs, a.acknowledgedBy])).toEqual([
      ['Load 1: Jam', 25 * SEC, 'Maren'],
      ['Load 1: rest', 2 * MIN + 10 * SEC, 'Teo'],
    ]);
    expect(s.longestRingMs).toBe(130 * SEC);
    expect(s.averageRingMs).toBe(((25 + 130) * SEC) / 2);
    expect(s.alarmsUnanswered).toBe(0);
    expect(s.seals).toEqual({ checked: 4, sealed: 3, rate: 0.75 });
  });

  it('lists every override with who made it and the reason, with outside overrides in time order', () => {
    const { j } = jamDay();
    const s = summariseDay(j.entries, {
      otherOverrides: [
        {
          seq: null,
          at: T0 + 30 * MIN,
          byName: 'Maren',
          reason: 'Moving house',
          what: 'Bands off early',
          loadNumber: 1,
        },
      ],
    });
    expect(s.overrides.map((o) => [o.what, o.reason, o.byName])).toEqual([
      ['Bands off early', 'Moving house', 'Maren'],
      ['Load 1: rest: 2 min instead of at least 5 min', 'Pan on fire, needed the burner', 'Maren'],
    ]);
  });

  it('an alarm nobody answered has no ring time and counts as unanswered', () => {
    const j = journal();
    const dip = j.timer({ kind: 'blanch', label: 'Dip', durationMs: 30 * SEC, startNow: true }, T0);
    j.fire(dip, T0 + 30 * SEC);
    const s = summariseDay(j.entries);
    expect(s.alarms[0]).toMatchObject({ ringMs: null, acknowledgedAt: null });
    expect(s.alarmsUnanswered).toBe(1);
    expect(s.longestRingMs).toBeNull();
    expect(s.seals.rate).toBeNull();
  });

  it('reads entries in seq order whatever order they arrive in', () => {
    const { j } = jamDay();
    expect(summariseDay([...j.entries].reverse())).toEqual(summariseDay(j.entries));
  });
});

describe('placeEntries and filterEntries', () => {
  it('puts canner timers at their canner, blanching at prep, cooling on the shelf, and filters by all three', () => {
    const { j, load1, load2 } = jamDay();
    const placed = placeEntries(j.entries);
    const station = (type: string) => placed.find((p) => p.entry.type === type)?.station;
    expect(station('timer.heating')).toBe(`canner:${CANNER}`);
    expect(station('load.lifted')).toBe(`canner:${CANNER}`);
    expect(station('day.opened')).toBe('day');
    expect(placed.filter((p) => p.station === 'cooling').map((p) => p.entry.type)).toEqual([
      'timer.created',
      'timer.started',
    ]);
    expect(placed.filter((p) => p.station === 'prep')).toHaveLength(2);
    expect(filterEntries(placed, { loadId: load2 }).map((p) => p.entry.type)).toEqual([
      'load.created',
      'timer.created',
    ]);
    expect(filterEntries(placed, { kind: 'override' })).toHaveLength(1);
    const ringing = filterEntries(placed, { loadId: load1, kind: 'alarm' });
    expect(ringing.map((p) => p.entry.type)).toEqual([
      'alarm.raised',
      'alarm.acknowledged',
      'alarm.raised',
      'alarm.acknowledged',
    ]);
    expect(filterEntries(placed, { station: 'stove' })).toEqual([]);
  });
});

describe('timelineLanes', () => {
  it('draws a lane per station and per load, phases in order and never overlapping', () => {
    const { j, load1 } = jamDay();
    const lanes = timelineLanes(j.entries, T0 + 60 * MIN);
    expect(lanes.map((l) => l.label)).toEqual(['Water bath', 'Cooling shelf', 'Prep', 'Load 1', 'Load 2']);
    const one = lanes.find((l) => l.id === `load:${load1}`)!;
    expect(one.segments.map((s) => [s.phase, (s.start - T0) / MIN, (s.end - T0) / MIN])).toEqual([
      ['filling', 1, 5],
      ['coming-up', 5, 35],
      ['processing', 35, 38],
      ['coming-up', 38, 41],
      ['processing', 41, 51],
      ['alarm', 51, 51 + 25 / 60],
      ['rest', 52, 54],
      ['alarm', 54, 56 + 10 / 60],
      ['cooling', 57, 60],
    ]);
    expect(one.segments.at(-1)?.open).toBe(true);
    for (const lane of lanes) {
      for (let i = 1; i < lane.segments.length; i += 1) {
        expect(lane.segments[i]!.start).toBeGreaterThanOrEqual(lane.segments[i - 1]!.end);
      }
    }
  });
});

describe('describeEntry', () => {
  it('tells each entry in plain words', () => {
    const { j } = jamDay();
    const words = j.entries.map((e) => describeEntry(e));
    expect(words).toContain('Load 1: Jam: Full rolling boil confirmed: the process time counts from now');
    expect(words).toContain(
      'Safety override: Load 1: rest (2 min instead of at least 5 min). Reason: Pan on fire, needed the burner',
    );
    expect(words).toContain('Alarm: Load 1: Jam: time is up');
    expect(words[0]).toBe('Day opened: Jam day (2026-08-15)');
    expect(words).toContain('Load 1 lifted out upright onto the cooling shelf');
  });
});
