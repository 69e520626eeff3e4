import { Injectable } from '@nestjs/common';
import { and, asc, desc, eq, max, sql } from 'drizzle-orm';
import type { Db } from '../db/database.js';
import { InjectDb } from '../db/database.module.js';
import { batches, days, loads } from '../db/schema/index.js';

export type DayRow = typeof days.$inferSelect;
export type BatchRow = typeof batches.$inferSelect;
export type LoadRow = typeof loads.$inferSelect;

const counts = {
  // Spelled out: Drizzle writes ${days.id} as a bare "id" here, which the subquery would read as its own column.
  batchCount: sql<number>`(select count(*) from ${batches} b where b.day_id = "days"."id")`,
  loadCount: sql<number>`(select count(*) from ${loads} l where l.day_id = "days"."id")`,
};

@Injectable()
export class DaysRepository {
  constructor(@InjectDb() private readonly db: Db) {}

  transaction<T>(fn: () => T): T {
    return this.db.transaction(() => fn());
  }

  insertDay(row: DayRow): void {
    this.db.insert(days).values(row).run();
  }

  findDay(kitchenId: string, dayId: string): DayRow | undefined {
    return this.db
      .select()
      .from(days)
      .where(and(eq(days.kitchenId, kitchenId), eq(days.id, dayId)))
      .get();
  }

  findDayById(dayId: string): DayRow | undefined {
    return this.db.select().from(days).where(eq(days.id, dayId)).get();
  }

  listDays(kitchenId: string, status: DayRow['status'] | undefined, limit: number) {
    return this.db
      .select({ day: days, ...counts })
      .from(days)
      .where(status ? and(eq(days.kitchenId, kitchenId), eq(days.status, status)) : eq(days.kitchenId, kitchenId))
      .orderBy(desc(days.date), desc(days.createdAt))
      .limit(limit)
      .all();
  }

  countsFor(dayId: string): { batchCount: number; loadCount: number } {
    return this.db.select(counts).from(days).where(eq(days.id, dayId)).get() ?? { batchCount: 0, loadCount: 0 };
  }

  closeDay(dayId: string, now: Date): boolean {
    return (
      this.db
        .update(days)
        .set({ status: 'closed', closedAt: now })
        .where(and(eq(days.id, dayId), eq(days.status, 'open')))
        .run().changes === 1
    );
  }

  /** Opens a closed day again; false when it was open already. */
  reopenDay(dayId: string): boolean {
    return (
      this.db
        .update(days)
        .set({ status: 'open', closedAt: null })
        .where(and(eq(days.id, dayId), eq(days.status, 'closed')))
        .run().changes === 1
    );
  }

  insertBatch(row: BatchRow): void {
    this.db.insert(batches).values(row).run();
  }

  findBatch(dayId: string, batchId: string): BatchRow | undefined {
    return this.db
      .select()
      .from(batches)
      .where(and(eq(batches.dayId, dayId), eq(batches.id, batchId)))
      .get();
  }

  listBatches(dayId: string): BatchRow[] {
    // rowid breaks ties between batches added in the same millisecond: the order they were added gives their letters.
    return this.db
      .select()
      .from(batches)
      .where(eq(batches.dayId, dayId))
      .orderBy(asc(batches.createdAt), sql`rowid`)
      .all();
  }

  /** Loads are numbered 1, 2, 3... within a day; call inside the transaction that inserts the load. */
  nextLoadNumber(dayId: string): number {
    const row = this.db
      .select({ n: max(loads.number) })
      .from(loads)
      .where(eq(loads.dayId, dayId))
      .get();
    return (row?.n ?? 0) + 1;
  }

  insertLoad(row: LoadRow): void {
    this.db.insert(loads).values(row).run();
  }

  findLoad(dayId: string, loadId: string): LoadRow | undefined {
    return this.db
      .select()
      .from(loads)
      .where(and(eq(loads.dayId, dayId), eq(loads.id, loadId)))
      .get();
  }

  setLifted(dayId: string, loadId: string, at: Date): void {
    this.db
      .update(loads)
      .set({ liftedAt: at })
      .where(and(eq(loads.dayId, dayId), eq(loads.id, loadId)))
      .run();
  }

  listLoads(dayId: string): LoadRow[] {
    return this.db.select().from(loads).where(eq(loads.dayId, dayId)).orderBy(asc(loads.number)).all();
  }
}
