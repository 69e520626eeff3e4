/** The demo's after-the-canner records: bands off, seal checks, pantry lots and what left the shelf. */
import { randomBytes, randomUUID } from 'node:crypto';
import { bestQualityDate } from '@jarday/rules';
import { eq } from 'drizzle-orm';
import type { Db } from '../apps/server/src/db/database.js';
import { type batches, loads, lotEntries, lots, sealChecks } from '../apps/server/src/db/schema/index.js';
import type { DaySim, SimActor } from './history-sim.js';
import type { PastDay } from './seed-schema.js';

const HOUR = 3_600_000;
type BatchRow = typeof batches.$inferSelect;

/** Bands off and seal checks 24 h after lifting; a lot per checked batch (code YYMMDD-<letter>), its entries. */
export function afterTheCanner(
  db: Db,
  kitchenId: string,
  sim: DaySim,
  past: PastDay,
  batches: BatchRow[],
  date: string,
  who: (email: string) => SimActor,
  now: number,
): void {
  const firstCheck = new Map<string, number>();
  past.loads.forEach((plan, i) => {
    const load = sim.loads[i]!;
    if (!plan.seals || !load.liftedAt) return;
    const at = load.liftedAt.getTime() + 24 * HOUR;
    if (at > now) throw new Error(`seed: load ${load.number} of "${past.title}" cannot be checked before now`);
    const checker = who(plan.seals.by);
    db.update(loads)
      .set({ bandsOffAt: new Date(at), bandsOffBy: checker.userId })
      .where(eq(loads.id, load.id))
      .run();
    for (let jar = 1; jar <= load.jars; jar += 1) {
      const result = plan.seals.broken.includes(jar)
        ? 'broken'
        : plan.seals.unsealed.includes(jar)
          ? 'unsealed'
          : 'sealed';
      const outcome = result === 'sealed' ? 'store' : result === 'broken' ? 'discard' : 'fridge';
      db.insert(sealChecks)
        .values({
          loadId: load.id,
          jarNumber: jar,
          dayId: sim.dayId,
          result,
          outcome,
          checkedAt: new Date(at),
          byUserId: checker.userId,
          byName: checker.name,
        })
        .run();
    }
    if (!firstCheck.has(load.batchId)) firstCheck.set(load.batchId, at);
  });
  for (const lot of past.lots) {
    const batch = batches[lot.batch];
    const madeAt = batch && firstCheck.get(batch.id);
    if (!batch || madeAt === undefined) throw new Error(`seed: a lot of "${past.title}" has no checked batch`);
    const lotId = randomUUID();
    db.insert(lots)
      .values({
        id: lotId,
        kitchenId,
        dayId: sim.dayId,
        batchId: batch.id,
        code: `${date.slice(2).replaceAll('-', '')}-${String.fromCharCode(65 + lot.batch)}`,
        publicToken: randomBytes(24).toString('base64url'),
        location: lot.location,
        bestBy: bestQualityDate(date),
        flaggedAt: null,
        createdAt: new Date(madeAt),
      })
      .run();
    for (const e of lot.entries) {
      const at = madeAt + e.daysAfter * 24 * HOUR;
      const person = who(e.by);
      db.insert(lotEntries)
        .values({
          id: randomUUID(),
          lotId,
          kind: e.kind,
          jars: e.jars,
          recipient: e.recipient ?? null,
          date: new Date(at).toISOString().slice(0, 10),
          note: e.note ?? null,
          byUserId: person.userId,
          byName: person.name,
          createdAt: new Date(at),
        })
        .run();
    }
  }
}
