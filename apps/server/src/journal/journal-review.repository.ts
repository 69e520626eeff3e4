import type { DaySummaryView, JournalEvent } from '@jarday/contracts';
import { Injectable } from '@nestjs/common';
import { and, asc, desc, eq, isNotNull, sql } from 'drizzle-orm';
import type { Db } from '../db/database.js';
import { InjectDb } from '../db/database.module.js';
import { batches, days, journal, kitchens, loads, sealChecks, users } from '../db/schema/index.js';

type DayRow = typeof days.$inferSelect;

const toDay = (d: DayRow & { batchCount: number; loadCount: number }): DaySummaryView => ({
  id: d.id,
  kitchenId: d.kitchenId,
  date: d.date,
  title: d.title,
  status: d.status,
  altitude: { value: d.altitudeValue, unit: d.altitudeUnit },
  createdAt: d.createdAt.toISOString(),
  closedAt: d.closedAt?.toISOString() ?? null,
  batchCount: d.batchCount,
  loadCount: d.loadCount,
});

// Drizzle writes a one-table select's columns unqualified ("id"), which inside these subqueries would mean the
// subquery's own id: the outer day is named in full.
const outerDayId = sql`${sql.identifier('days')}.${sql.identifier('id')}`;
const dayColumns = {
  day: days,
  batchCount: sql<number>`(select count(*) from ${batches} b where b.day_id = ${outerDayId})`,
  loadCount: sql<number>`(select count(*) from ${loads} l where l.day_id = ${outerDayId})`,
};

/** Read-only: the Journal reviews what the live day, the cooling shelf and the seal checks wrote. */
@Injectable()
export class JournalReviewRepository {
  constructor(@InjectDb() private readonly db: Db) {}

  findDay(kitchenId: string, dayId: string): DaySummaryView | undefined {
    const row = this.db
      .select(dayColumns)
      .from(days)
      .where(and(eq(days.kitchenId, kitchenId), eq(days.id, dayId)))
      .get();
    return row ? toDay({ ...row.day, batchCount: row.batchCount, loadCount: row.loadCount }) : undefined;
  }

  kitchenName(kitchenId: string): string {
    return this.db.select({ name: kitchens.name }).from(kitchens).where(eq(kitchens.id, kitchenId)).get()?.name ?? '';
  }

  /** The kitchen's days, newest first (by date, then by when they were made). */
  listDays(kitchenId: string, limit: number, closedOnly = false): DaySummaryView[] {
    return this.db
      .select(dayColumns)
      .from(days)
      .where(closedOnly ? and(eq(days.kitchenId, kitchenId), eq(days.status, 'closed')) : eq(days.kitchenId, kitchenId))
      .orderBy(desc(days.date), desc(days.closedAt), desc(days.createdAt))
      .limit(limit)
      .all()
      .map((r) => toDay({ ...r.day, batchCount: r.batchCount, loadCount: r.loadCount }));
  }

  /** Every entry of the day, oldest first, as the live server sent them. */
  entries(dayId: string): JournalEvent[] {
    return this.db
      .select()
      .from(journal)
      .where(eq(journal.dayId, dayId))
      .orderBy(asc(journal.seq))
      .all()
      .map((r) => ({
        seq: r.seq,
        dayId: r.dayId,
        at: new Date(r.at).toISOString(),
        actor: r.actorId ? { userId: r.actorId, name: r.actorName } : null,
        deviceId: r.deviceId === '' ? null : r.deviceId,
        type: r.type,
        payload: r.payload,
      }));
  }

  /** One result per checked jar of the day. */
  sealResults(dayId: string): string[] {
    return this.db
      .select({ result: sealChecks.result })
      .from(sealChecks)
      .where(eq(sealChecks.dayId, dayId))
      .all()
      .map((r) => r.result);
  }

  /** Loads of the day whose bands came off early on a lead's written reason (`by`: the user id, or a name). */
  bandOverrides(dayId: string) {
    return this.db
      .select({
        number: loads.number,
        at: loads.bandsOffAt,
        reason: loads.bandsOffOverride,
        byName: users.name,
        by: loads.bandsOffBy,
      })
      .from(loads)
      .leftJoin(users, eq(users.id, loads.bandsOffBy))
      .where(and(eq(loads.dayId, dayId), isNotNull(loads.bandsOffOverride)))
      .orderBy(asc(loads.number))
      .all();
  }
}
