// Invented days, loads and timers for the day feature's tests. Timers are made and moved by the real core
// (@jarday/live) and plans by the real rules (@jarday/rules), so the tests see exactly what the server would send.
import type { BatchView, DayView, JournalEvent, LoadView, NewTimer, Timer, TimerCommand } from '@jarday/contracts';
import { applyTimerCommand, createTimer, fireDue, MINUTE_MS, type TimerEvent } from '@jarday/live';
import { planProcess, type ProcessPlan } from '@jarday/rules';

export const T0 = Date.UTC(2025, 8, 6, 8, 0, 0);
export const KITCHEN_ID = '5f3c2b1a-7d6e-4c8b-9a0f-1e2d3c4b5a69';
export const DAY_ID = '6f1c2a4e-8d3b-4c5a-9e7f-1a2b3c4d5e6f';
export const BATCH_ID = '7a1b2c3d-4e5f-4a6b-8c7d-9e0f1a2b3c4d';
export const LOAD_ID = 'c3d4e5f6-a7b8-4c9d-8e0f-112233445566';
const HELPER = 'user-helper-bo';

/**
 * Hot-packed jam, half-pints, in a boiling-water canner at 2,350 ft: 10 min (USDA Guide 7, secondary copy). The
 * pressure variant's 20 minutes are invented: the tests that use it check the sequence of steps, not the time.
 */
export function jamPlan(method: 'boiling-water' | 'pressure' = 'boiling-water'): ProcessPlan {
  const result = planProcess({
    recipe: {
      name: method === 'pressure' ? 'Invented pressure recipe' : 'Hot-packed jam',
      productClass: method === 'pressure' ? 'low-acid' : 'acid',
      acidification: null,
      tested: true,
      headspaceInches: method === 'pressure' ? 1 : 0.25,
      processing:
        method === 'pressure'
          ? { pressure: { rows: [{ jarSize: 'pint', pack: 'hot', minutes: 20 }] } }
          : {
              boilingWater: {
                bands: [1000, 6000, null],
                rows: [{ jarSize: 'half-pint', pack: 'hot', minutes: [5, 10, 15] }],
              },
            },
    },
    jarSize: method === 'pressure' ? 'pint' : 'half-pint',
    pack: 'hot',
    altitude: { value: 2350, unit: 'ft' },
    canner:
      method === 'pressure'
        ? { method: 'pressure', gauge: 'weighted', capacity: { pint: 10 } }
        : { method: 'boiling-water', gauge: null, capacity: { 'half-pint': 12 } },
  });
  if (!result.ok) throw new Error(result.reason.message);
  return result.plan;
}

export const batch = (over: Partial<BatchView> = {}): BatchView => ({
  id: BATCH_ID,
  dayId: DAY_ID,
  recipeId: 'recipe-jam',
  recipeName: 'Hot-packed jam',
  tested: true,
  jarSize: 'half-pint',
  pack: 'hot',
  jars: 12,
  createdAt: '2025-09-06T07:30:00.000Z',
  ...over,
});

export const load = (over: Partial<LoadView> = {}): LoadView => ({
  id: LOAD_ID,
  dayId: DAY_ID,
  batchId: BATCH_ID,
  number: 1,
  cannerId: '3c2b1a09-8f7e-4d6c-b5a4-9382716a5b4c',
  cannerName: 'Speckled canner',
  method: 'boiling-water',
  jars: 6,
  plan: jamPlan(),
  liftedAt: null,
  createdAt: '2025-09-06T07:40:00.000Z',
  ...over,
});

export const day = (over: Partial<DayView> = {}): DayView => ({
  id: DAY_ID,
  kitchenId: KITCHEN_ID,
  date: '2025-09-06',
  title: 'Jam day',
  status: 'open',
  altitude: { value: 2350, unit: 'ft' },
  createdAt: '2025-09-06T07:00:00.000Z',
  closedAt: null,
  batchCount: 1,
  loadCount: 1,
  batches: [batch()],
  loads: [load()],
  seq: 0,
  ...over,
});

let ids = 0;
const nextId = () => `0b7e9d2c-3f4a-4b5c-8d6e-${String(++ids).padStart(12, '0')}`;

/** A new timer as the server's core makes it. */
export function timer(input: NewTimer, at = T0, id = nextId()): Timer {
  const made = createTimer(input, { now: at, actorRole: 'helper', actorId: HELPER, timerId: id, dayId: DAY_ID });
  if (!made.ok) throw new Error(made.error.message);
  return made.timer;
}

/** A command applied by the real core, with the events it produced. */
export function apply(t: Timer, command: TimerCommand, at: number): { timer: Timer; events: TimerEvent[] } {
  const result = applyTimerCommand(t, command, { now: at, actorRole: 'helper', actorId: HELPER });
  if (!result.ok) throw new Error(result.error.message);
  return { timer: result.timer, events: result.events };
}

export const move = (t: Timer, command: TimerCommand, at: number) => apply(t, command, at).timer;

/** The timer after its deadline fired (alarm raised). */
export function fired(t: Timer): Timer {
  const result = fireDue(t, t.deadlineAt ?? T0);
  if (!result.ok) throw new Error(result.error.message);
  return result.timer;
}

/** The load's 10-minute process timer, armed. */
export const processTimer = (at = T0) =>
  timer({ kind: 'process', label: 'Load 1: Hot-packed jam', testedMs: 10 * MINUTE_MS, loadId: LOAD_ID }, at);

/** A journal entry as the server broadcasts it for a timer change. */
export function journal(seq: number, t: Timer, type = 'timer.started', dayId = DAY_ID): JournalEvent {
  return {
    seq,
    dayId,
    at: new Date(t.updatedAt).toISOString(),
    actor: { userId: HELPER, name: 'Bo' },
    deviceId: 'device-tablet-1',
    type,
    payload: { timerId: t.id, from: null, to: t.state, detail: {}, timer: t },
  };
}
