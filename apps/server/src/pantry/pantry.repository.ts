import type { LotEntryKind } from '@jarday/contracts';
import type { JarSize } from '@jarday/rules';
import { Injectable } from '@nestjs/common';
import { and, asc, desc, eq, inArray, sql } from 'drizzle-orm';
import type { Db } from '../db/database.js';
import { InjectDb } from '../db/database.module.js';
import { batches, days, loads, lotEntries, lots, sealChecks } from '../db/schema/index.js';

export type LotRow = typeof lots.$inferSelect;
export type LotEntryRow = typeof lotEntries.$inferSelect;

/** A lot with what its labels and the shelf need: the day, the batch's recipe and jar size, and the jar counts. */
export interface LotListRow {
  lot: LotRow;
  dayDate: string;
  recipeName: string;
  jarSize: JarSize;
  sealed: number;
  eaten: number;
  given: number;
  spoiled: number;
}

const taken = (kind: LotEntryKind) =>
  sql<number>`coalesce((select sum(e.jars) from ${lotEntries} e where e.lot_id = ${lots.id} and e.kind = ${kind}), 0)`;

/** Every jar of the batch that sealed, in any of its loads: a reprocessed jar counts when its second check seals. */
const sealedOfBatch = sql<number>`(select count(*) from ${sealChecks} sc join ${loads} l on l.id = sc.load_id
  where l.batch_id = ${lots.batchId} and sc.result = 'sealed')`;

const listColumns = {
  lot: lots,
  dayDate: days.date,
  recipeName: sql<string>`json_extract(${batches.recipe}, '$.name')`,
  jarSize: batches.jarSize,
  sealed: sealedOfBatch,
  eaten: taken('eaten'),
  given: taken('gift'),
  spoiled: taken('spoiled'),
};

@Injectable()
export class PantryRepository {
  constructor(@InjectDb() private readonly db: Db) {}

  transaction<T>(fn: () => T): T {
    return this.db.transaction(() => fn());
  }

  findLotOfBatch(batchId: string): LotRow | undefined {
    return this.db.select().from(lots).where(eq(lots.batchId, batchId)).get();
  }

  lotsOfBatches(batchIds: string[]): LotRow[] {
    if (batchIds.length === 0) return [];
    return this.db.select().from(lots).where(inArray(lots.batchId, batchIds)).all();
  }

  codeTaken(kitchenId: string, code: string): boolean {
    return !!this.db
      .select({ id: lots.id })
      .from(lots)
      .where(and(eq(lots.kitchenId, kitchenId), eq(lots.code, code)))
      .get();
  }

  insertLot(row: LotRow): void {
    this.db.insert(lots).values(row).run();
  }

  list(kitchenId: string, dayId: string | undefined): LotListRow[] {
    return this.db
      .select(listColumns)
      .from(lots)
      .innerJoin(days, eq(days.id, lots.dayId))
      .innerJoin(batches, eq(batches.id, lots.batchId))
      .where(dayId ? and(eq(lots.kitchenId, kitchenId), eq(lots.dayId, dayId)) : eq(lots.kitchenId, kitchenId))
      .orderBy(desc(days.date), asc(lots.code))
      .all();
  }

  find(kitchenId: string, lotId: string): LotListRow | undefined {
    return this.db
      .select(listColumns)
      .from(lots)
      .innerJoin(days, eq(days.id, lots.dayId))
      .innerJoin(batches, eq(batches.id, lots.batchId))
      .where(and(eq(lots.kitchenId, kitchenId), eq(lots.id, lotId)))
      .get();
  }

  setLocation(lotId: string, location: string | null): void {
    this.db.update(lots).set({ location }).where(eq(lots.id, lotId)).run();
  }

  /** The first spoilage report flags the lot; a later one keeps the first time. */
  flag(lotId: string, at: Date): void {
    this.db
      .update(lots)
      .set({ flaggedAt: sql`coalesce(${lots.flaggedAt}, ${at.getTime()})` })
      .where(eq(lots.id, lotId))
      .run();
  }

  insertEntry(row: LotEntryRow): void {
    this.db.insert(lotEntries).values(row).run();
  }

  entriesOf(lotIds: string[]): LotEntryRow[] {
    if (lotIds.length === 0) return [];
    return this.db
      .select()
      .from(lotEntries)
      .where(inArray(lotEntries.lotId, lotIds))
      .orderBy(desc(lotEntries.date), desc(lotEntries.createdAt))
      .all();
  }
}
