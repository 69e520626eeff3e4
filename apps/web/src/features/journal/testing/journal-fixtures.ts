// An invented day for the Journal's tests, told through the real state machines so the entries are the real shape.
import type { DayReviewView, DaySummaryView, JournalEntryView, JournalEvent, JournalView } from '@jarday/contracts';
import {
  applyTimerCommand,
  createTimer,
  describeEntry,
  dayFacets,
  fireDue,
  placeEntries,
  summariseDay,
  timelineLanes,
  type TimerResult,
} from '@jarday/live';

export const KITCHEN_ID = '7a6b5c4d-3e2f-4a1b-9c8d-7e6f5a4b3c2d';
export const DAY_ID = '1b2c3d4e-5f6a-4b7c-8d9e-0f1a2b3c4d5e';
export const LOAD_ID = '2c3d4e5f-6a7b-4c8d-9e0f-1a2b3c4d5e6f';
const CANNER_ID = '3d4e5f6a-7b8c-4d9e-8f0a-2b3c4d5e6f7a';
export const T0 = Date.UTC(2026, 7, 15, 9, 0, 0);
const MIN = 60_000;
const TEO = { userId: 'u-teo', name: 'Teo Vance' };
const MAREN = { userId: 'u-maren', name: 'Maren Okafor' };
export const REASON = 'Pot scorching on the next burner';

export const day: DaySummaryView = {
  id: DAY_ID,
  kitchenId: KITCHEN_ID,
  date: '2026-08-15',
  title: 'Jam Saturday',
  status: 'closed',
  altitude: { value: 2350, unit: 'ft' },
  createdAt: new Date(T0).toISOString(),
  closedAt: new Date(T0 + 90 * MIN).toISOString(),
  batchCount: 1,
  loadCount: 1,
};

function entries(): JournalEvent[] {
  const out: JournalEvent[] = [];
  const push = (at: number, type: string, payload: unknown, actor: typeof TEO | null) =>
    out.push({
      seq: out.length + 1,
      dayId: DAY_ID,
      at: new Date(at).toISOString(),
      actor,
      deviceId: actor ? 'tablet-0001' : null,
      type,
      payload,
    });
  const take = (r: TimerResult, actor: typeof TEO | null) => {
    if (!r.ok) throw new Error(r.error.message);
    for (const e of r.events)
      push(e.at, e.type, { timerId: e.timerId, from: e.from, to: e.to, detail: e.detail, timer: r.timer }, actor);
    return r.timer;
  };
  push(T0, 'day.opened', { date: day.date, title: day.title }, MAREN);
  const load = {
    id: LOAD_ID,
    number: 1,
    cannerId: CANNER_ID,
    cannerName: 'Speckled canner',
    jars: 6,
    plan: { recipeName: 'Hot-packed jam', jarSize: 'half-pint', minutes: 10 },
    liftedAt: null,
  };
  push(T0 + MIN, 'load.created', { load }, TEO);
  const ctx = (now: number, who = TEO, role: 'lead' | 'helper' = 'helper') => ({
    now,
    actorRole: role,
    actorId: who.userId,
  });
  let p = take(
    createTimer(
      { kind: 'process', label: 'Load 1: Hot-packed jam', testedMs: 10 * MIN, loadId: LOAD_ID },
      { ...ctx(T0 + MIN), timerId: 't-1', dayId: DAY_ID },
    ),
    TEO,
  );
  p = take(applyTimerCommand(p, { type: 'water-heating' }, ctx(T0 + 5 * MIN)), TEO);
  p = take(applyTimerCommand(p, { type: 'rolling-boil' }, ctx(T0 + 33 * MIN)), TEO);
  p = take(fireDue(p, T0 + 43 * MIN), null);
  take(applyTimerCommand(p, { type: 'acknowledge' }, ctx(T0 + 43 * MIN + 20_000)), TEO);
  take(
    createTimer(
      {
        kind: 'canner-rest',
        label: 'Load 1: rest in the open canner',
        loadId: LOAD_ID,
        startNow: true,
        durationMs: 2 * MIN,
        override: { reason: REASON },
      },
      { ...ctx(T0 + 44 * MIN, MAREN, 'lead'), timerId: 't-2', dayId: DAY_ID },
    ),
    MAREN,
  );
  return out;
}

/** The views the server would answer for this day (same library functions the server uses). */
export function journalFixtures() {
  const all = entries();
  const placed = placeEntries(all);
  const numbers = new Map(dayFacets(placed).loads.map((l) => [l.id, l.number]));
  const views: JournalEntryView[] = placed.map((p) => ({
    ...p.entry,
    kind: p.kind,
    station: p.station,
    stationLabel: p.stationLabel,
    loadId: p.loadId,
    loadNumber: p.loadNumber,
    text: describeEntry(p.entry, numbers),
  }));
  const facets = dayFacets(placed);
  const journal = (keep: (e: JournalEntryView) => boolean = () => true): JournalView => ({
    day,
    stations: facets.stations,
    loads: facets.loads.map((l) => ({ id: l.id, number: l.number, label: `Load ${l.number}: ${l.plan.recipeName}` })),
    total: views.length,
    entries: views.filter(keep),
  });
  const until = T0 + 90 * MIN;
  const review: DayReviewView = {
    day,
    summary: summariseDay(all, { sealResults: ['sealed', 'sealed', 'sealed', 'unsealed'] }),
    lanes: timelineLanes(all, until),
    until,
  };
  return { journal, review };
}
