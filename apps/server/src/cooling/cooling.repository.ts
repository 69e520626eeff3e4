import type { JarSize } from '@jarday/rules';
import { Injectable } from '@nestjs/common';
import { and, asc, eq, gte, inArray, isNotNull, isNull, lt, or, sql } from 'drizzle-orm';
import type { Db } from '../db/database.js';
import { InjectDb } from '../db/database.module.js';
import { batches, days, loads, sealChecks } from '../db/schema/index.js';
import type { BatchRow, DayRow, LoadRow } from '../days/days.repository.js';

export type SealCheckRow = typeof sealChecks.$inferSelect;

/** A load on the shelf with its day and what of its batch the shelf shows. */
export interface ShelfRow {
  load: LoadRow;
  day: DayRow;
  recipeName: string;
  jarSize: JarSize;
}

const checkedCount = sql<number>`(select count(*) from ${sealChecks} sc where sc.load_id = ${loads.id})`;

const shelfColumns = {
  load: loads,
  day: days,
  recipeName: sql<string>`json_extract(${batches.recipe}, '$.name')`,
  jarSize: batches.jarSize,
};

@Injectable()
export class CoolingRepository {
  constructor(@InjectDb() private readonly db: Db) {}

  /** A load of the kitchen by id, with its day and batch: the cooling routes name loads without their day. */
  findLoad(kitchenId: string, loadId: string): { load: LoadRow; day: DayRow; batch: BatchRow } | undefined {
    return this.db
      .select({ load: loads, day: days, batch: batches })
      .from(loads)
      .innerJoin(days, eq(days.id, loads.dayId))
      .innerJoin(batches, eq(batches.id, loads.batchId))
      .where(and(eq(days.kitchenId, kitchenId), eq(loads.id, loadId)))
      .get();
  }

  /**
   * Lifted loads still on the shelf (bands on, or jars not all checked), whatever their age, and those lifted since
   * `recentSince`, finished or not. Oldest lifting first: the bands due soonest come first.
   */
  shelf(kitchenId: string, recentSince: Date): ShelfRow[] {
    return this.db
      .select(shelfColumns)
      .from(loads)
      .innerJoin(days, eq(days.id, loads.dayId))
      .innerJoin(batches, eq(batches.id, loads.batchId))
      .where(
        and(
          eq(days.kitchenId, kitchenId),
          isNotNull(loads.liftedAt),
          or(gte(loads.liftedAt, recentSince), isNull(loads.bandsOffAt), lt(checkedCount, loads.jars)),
        ),
      )
      .orderBy(asc(loads.liftedAt), asc(loads.number))
      .all();
  }

  /** Every lifted load of one day, however old. */
  shelfOfDay(dayId: string): ShelfRow[] {
    return this.db
      .select(shelfColumns)
      .from(loads)
      .innerJoin(days, eq(days.id, loads.dayId))
      .innerJoin(batches, eq(batches.id, loads.batchId))
      .where(and(eq(loads.dayId, dayId), isNotNull(loads.liftedAt)))
      .orderBy(asc(loads.liftedAt), asc(loads.number))
      .all();
  }

  checksOf(loadIds: string[]): SealCheckRow[] {
    if (loadIds.length === 0) return [];
    return this.db
      .select()
      .from(sealChecks)
      .where(inArray(sealChecks.loadId, loadIds))
      .orderBy(asc(sealChecks.loadId), asc(sealChecks.jarNumber))
      .all();
  }

  /** The latest word on each jar wins: a check can be corrected. */
  upsertChecks(rows: SealCheckRow[]): void {
    for (const row of rows) {
      this.db
        .insert(sealChecks)
        .values(row)
        .onConflictDoUpdate({ target: [sealChecks.loadId, sealChecks.jarNumber], set: row })
        .run();
    }
  }

  /** Bands off once: false when they were already off. */
  setBandsOff(loadId: string, at: Date, byUserId: string, override: string | null): boolean {
    return (
      this.db
        .update(loads)
        .set({ bandsOffAt: at, bandsOffBy: byUserId, bandsOffOverride: override })
        .where(and(eq(loads.id, loadId), isNull(loads.bandsOffAt)))
        .run().changes === 1
    );
  }

  /** Which loads carried the jars of these loads again: original id -> reprocessing load. */
  reprocessingOf(loadIds: string[]): Map<string, LoadRow> {
    if (loadIds.length === 0) return new Map();
    const rows = this.db.select().from(loads).where(inArray(loads.reprocessOf, loadIds)).all();
    return new Map(rows.map((r) => [r.reprocessOf!, r]));
  }

  /** Every check of the day: each jar that went through a canner counts, a reprocessed jar once per processing. */
  sealCounts(dayIds: string[]): Map<string, { checked: number; sealed: number }> {
    if (dayIds.length === 0) return new Map();
    const rows = this.db
      .select({
        dayId: sealChecks.dayId,
        checked: sql<number>`count(*)`,
        sealed: sql<number>`sum(case when ${sealChecks.result} = 'sealed' then 1 else 0 end)`,
      })
      .from(sealChecks)
      .where(inArray(sealChecks.dayId, dayIds))
      .groupBy(sealChecks.dayId)
      .all();
    return new Map(rows.map((r) => [r.dayId, { checked: r.checked, sealed: r.sealed }]));
  }
}
