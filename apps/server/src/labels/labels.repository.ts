import { Injectable } from '@nestjs/common';
import { and, asc, eq, inArray } from 'drizzle-orm';
import type { Db } from '../db/database.js';
import { InjectDb } from '../db/database.module.js';
import { batches, days, kitchens, loads, lots, sealChecks } from '../db/schema/index.js';

export type LotWithDay = {
  lot: typeof lots.$inferSelect;
  day: typeof days.$inferSelect;
  batch: typeof batches.$inferSelect;
  kitchenName: string;
};
export type LoadRow = typeof loads.$inferSelect;
export type SealCheckRow = typeof sealChecks.$inferSelect;

/** Read-only queries for labels and jar records. */
@Injectable()
export class LabelsRepository {
  constructor(@InjectDb() private readonly db: Db) {}

  private lotQuery() {
    return this.db
      .select({ lot: lots, day: days, batch: batches, kitchenName: kitchens.name })
      .from(lots)
      .innerJoin(days, eq(days.id, lots.dayId))
      .innerJoin(batches, eq(batches.id, lots.batchId))
      .innerJoin(kitchens, eq(kitchens.id, lots.kitchenId));
  }

  lotInKitchen(kitchenId: string, lotId: string): LotWithDay | undefined {
    return this.lotQuery()
      .where(and(eq(lots.kitchenId, kitchenId), eq(lots.id, lotId)))
      .get();
  }

  /** The lot a label names by its public token, whatever the kitchen: the caller decides what to show. */
  lotByToken(token: string): LotWithDay | undefined {
    return this.lotQuery().where(eq(lots.publicToken, token)).get();
  }

  loadsOfBatch(batchId: string): LoadRow[] {
    return this.db.select().from(loads).where(eq(loads.batchId, batchId)).orderBy(asc(loads.number)).all();
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
}
