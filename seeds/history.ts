/**
 * The demo kitchen's past days: each load's taps and the server's firings are put on one clock, run in time order
 * through DaySim (the real state machines and repositories), so the journal reads as if the days had happened.
 */
import { randomUUID } from 'node:crypto';
import { rulesOf } from '@jarday/contracts';
import { CANNER_REST_MS, COOLING_REST_MS, type Timer } from '@jarday/live';
import { planProcess } from '@jarday/rules';
import type { Db } from '../apps/server/src/db/database.js';
import { type batches as batchTable, canners, kitchens, recipes } from '../apps/server/src/db/schema/index.js';
import { eq } from 'drizzle-orm';
import { afterTheCanner } from './history-after-canner.js';
import { DaySim, type SimActor } from './history-sim.js';
import type { PastDay, PastLoad } from './seed-schema.js';

const HOUR = 3_600_000;
const MIN = 60_000;
/** How late a Node timeout typically runs after its deadline: the server's firings are stamped this much after. */
const FIRING_LATENESS_MS = 4;
const LOAD_STEPS = ['fill', 'headspace', 'free-bubbles', 'wipe-rims', 'lids-bands', 'water-over-jars'] as const;

interface Crew {
  byEmail: Map<string, SimActor>;
}
type CannerRow = typeof canners.$inferSelect;
type BatchRow = typeof batchTable.$inferSelect;
type RecipeRow = typeof recipes.$inferSelect;

/** Actions on one clock, run earliest first; an action may schedule later ones. */
class Clock {
  private queue: { at: number; n: number; run: () => void }[] = [];
  private n = 0;
  at(at: number, run: () => void): void {
    this.queue.push({ at, n: (this.n += 1), run });
  }
  runAll(): void {
    for (;;) {
      this.queue.sort((a, b) => a.at - b.at || a.n - b.n);
      const next = this.queue.shift();
      if (!next) return;
      next.run();
    }
  }
}

/** Every person of the seed gets a device of their own: the journal names both. */
export function crewOf(people: { id: string; email: string; name: string; role: SimActor['role'] }[]): Crew {
  return {
    byEmail: new Map(
      people.map((p) => [p.email, { userId: p.id, name: p.name, role: p.role, deviceId: randomUUID() }] as const),
    ),
  };
}

/** Loads every past day of the seed into the kitchen, relative to `now`. Runs inside the caller's transaction. */
export function loadHistory(db: Db, kitchenId: string, history: PastDay[], crew: Crew, now: number): void {
  const kitchen = db.select().from(kitchens).where(eq(kitchens.id, kitchenId)).get()!;
  const kitchenCanners = db.select().from(canners).where(eq(canners.kitchenId, kitchenId)).all();
  const kitchenRecipes = db.select().from(recipes).where(eq(recipes.kitchenId, kitchenId)).all();
  const who = (email: string) => {
    const actor = crew.byEmail.get(email);
    if (!actor) throw new Error(`seed: no person ${email}`);
    return actor;
  };
  for (const past of history) {
    const sim = new DaySim(db, randomUUID());
    const clock = new Clock();
    const opened = now - past.openedHoursAgo * HOUR;
    let date = '';
    const batches: BatchRow[] = [];
    clock.at(opened, () => {
      date = sim.open(kitchen, past.title, who(past.openedBy), opened);
    });
    past.batches.forEach((b, i) => {
      const recipe = kitchenRecipes.find((r) => r.copiedFrom === b.recipe);
      if (!recipe) throw new Error(`seed: the demo kitchen has no ${b.recipe}`);
      const at = opened + (i + 1) * 3 * MIN;
      clock.at(at, () => batches.push(sim.addBatch(recipe, b.jarSize, b.pack, b.jars, who(past.openedBy), at)));
      clock.at(at + 20 * MIN, () => sim.tick('batch', batches[i]!.id, 'warm-jars', who(past.openedBy), at + 20 * MIN));
    });
    for (const load of past.loads) {
      const canner = kitchenCanners.find((c) => c.name === load.canner);
      const b = past.batches[load.batch];
      const recipe = kitchenRecipes.find((r) => r.copiedFrom === b?.recipe);
      if (!canner || !b || !recipe) throw new Error(`seed: a load of "${past.title}" names no canner or batch`);
      const minutes = processMinutes(recipe, b, canner, kitchen);
      scheduleLoad(clock, sim, () => batches[load.batch]!, canner, load, minutes, who, now, past.closedHoursAgo);
    }
    const closed = now - past.closedHoursAgo * HOUR;
    clock.at(closed, () => sim.close(who(past.openedBy), closed));
    clock.runAll();
    afterTheCanner(db, kitchenId, sim, past, batches, date, who, now);
  }
}

function processMinutes(
  recipe: RecipeRow,
  b: PastDay['batches'][number],
  canner: CannerRow,
  k: typeof kitchens.$inferSelect,
) {
  const plan = planProcess({
    recipe: rulesOf(recipe.data),
    jarSize: b.jarSize,
    pack: b.pack,
    altitude: { value: k.altitudeValue, unit: k.altitudeUnit },
    canner,
  });
  if (!plan.ok) throw new Error(`seed: no plan for ${recipe.name}: ${plan.reason.message}`);
  return plan.plan.minutes;
}

/**
 * One boiling-water load, worked back from the moment its jars were lifted: fill and ticks, lid on, rolling boil
 * (lost and regained if told), the server firing the process, the alarm acknowledged, heat off and the rest in the
 * open canner, lifting out (the cooling rest), and the cooling rest firing 12 h later if that moment has come.
 */
function scheduleLoad(
  clock: Clock,
  sim: DaySim,
  batch: () => BatchRow,
  canner: CannerRow,
  load: PastLoad,
  minutes: number,
  who: (email: string) => SimActor,
  now: number,
  closedHoursAgo: number,
): void {
  const by = who(load.by);
  const acker = who(load.ackBy);
  const lift = now - load.liftedHoursAgo * HOUR;
  const restMs = load.restOverride ? load.restOverride.minutes * MIN : CANNER_REST_MS;
  const restAcked = lift - 1000;
  const restFired = restAcked - 12_000;
  const restStart = restFired - FIRING_LATENESS_MS - restMs;
  const processAcked = restStart - 1000;
  const processFired = processAcked - load.ackSeconds * 1000;
  const lastBoil = processFired - FIRING_LATENESS_MS - minutes * MIN;
  const lostMs = load.boilLost ? (load.boilLost.afterMinutes + load.boilLost.backAfterMinutes) * MIN : 0;
  const firstBoil = lastBoil - lostMs;
  const heating = firstBoil - load.comeUpMinutes * MIN;
  const created = heating - 14 * MIN;
  const t: { process?: Timer; rest?: Timer; cooling?: Timer; loadId?: string } = {};

  clock.at(created, () => {
    const made = sim.addLoad(batch(), canner, load.jars, by, created);
    t.process = made.process;
    t.loadId = made.load.id;
  });
  LOAD_STEPS.forEach((step, i) => {
    const at = created + (i + 1) * 2 * MIN;
    clock.at(at, () => sim.tick('load', t.loadId!, step, by, at));
  });
  clock.at(heating, () => sim.command(t.process!, { type: 'water-heating' }, by, heating));
  clock.at(firstBoil, () => sim.command(t.process!, { type: 'rolling-boil' }, by, firstBoil));
  if (load.boilLost) {
    const lost = firstBoil + load.boilLost.afterMinutes * MIN;
    clock.at(lost, () => sim.command(t.process!, { type: 'boil-lost' }, by, lost));
    clock.at(lastBoil, () => sim.command(t.process!, { type: 'rolling-boil' }, by, lastBoil));
  }
  clock.at(processFired, () => sim.fire(t.process!, processFired));
  clock.at(processAcked, () => sim.command(t.process!, { type: 'acknowledge' }, acker, processAcked));
  const restBy = load.restOverride ? who(load.restOverride.by) : by;
  clock.at(restStart, () => {
    t.rest = sim.create(
      {
        kind: 'canner-rest',
        label: `Load ${sim.loads.find((l) => l.id === t.loadId)!.number}: rest in the open canner`,
        loadId: t.loadId,
        startNow: true,
        ...(load.restOverride ? { durationMs: restMs, override: { reason: load.restOverride.reason } } : {}),
      },
      restBy,
      restStart,
    );
    sim.tick('load', t.loadId!, 'heat-off-lid-off', by, restStart);
  });
  clock.at(restFired, () => sim.fire(t.rest!, restFired));
  clock.at(restAcked, () => sim.command(t.rest!, { type: 'acknowledge' }, by, restAcked));
  clock.at(lift, () => {
    const number = sim.loads.find((l) => l.id === t.loadId)!.number;
    t.cooling = sim.create(
      { kind: 'cooling-rest', label: `Load ${number}: cooling shelf`, loadId: t.loadId, startNow: true },
      by,
      lift,
    );
    sim.tick('load', t.loadId!, 'lift-jars', by, lift);
  });
  // The cooling rest rings 12 h after lifting; on a day still open someone silences it.
  const coolFired = lift + COOLING_REST_MS + FIRING_LATENESS_MS;
  const coolAcked = coolFired + 40_000;
  if (coolFired <= now) clock.at(coolFired, () => sim.fire(t.cooling!, coolFired));
  if (coolAcked <= now - closedHoursAgo * HOUR) {
    clock.at(coolAcked, () => sim.command(t.cooling!, { type: 'acknowledge' }, acker, coolAcked));
  }
}
