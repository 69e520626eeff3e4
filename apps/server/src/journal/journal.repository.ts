import type { JournalActor, JournalEvent } from '@jarday/contracts';
import { Injectable } from '@nestjs/common';
import { and, asc, eq, gt, sql } from 'drizzle-orm';
import type { Db } from '../db/database.js';
import { InjectDb } from '../db/database.module.js';
import { days, journal } from '../db/schema/index.js';

export interface JournalEntryInput {
  dayId: string;
  at: number;
  actor: JournalActor | null;
  deviceId: string | null;
  type: string;
  payload: Record<string, unknown>;
}

type JournalRow = typeof journal.$inferSelect;

const toEvent = (r: JournalRow): JournalEvent => ({
  seq: r.seq,
  dayId: r.dayId,
  at: new Date(r.at).toISOString(),
  actor: r.actorId ? { userId: r.actorId, name: r.actorName } : null,
  deviceId: r.deviceId === '' ? null : r.deviceId,
  type: r.type,
  payload: r.payload,
});

/**
 * The append-only journal. `append` must run inside the transaction of the change it records: it takes the
 * day's next sequence number and writes the row in that same transaction, so a change without its entry (or an
 * entry without its change) cannot exist, and numbers have no gaps.
 */
@Injectable()
export class JournalRepository {
  /** Every command appends: the two statements are prepared once (`npm run bench` measures the difference). */
  private readonly nextSeq;
  private readonly insertRow;

  constructor(@InjectDb() private readonly db: Db) {
    this.nextSeq = db
      .update(days)
      .set({ lastSeq: sql`${days.lastSeq} + 1` })
      .where(eq(days.id, sql.placeholder('dayId')))
      .returning({ seq: days.lastSeq })
      .prepare();
    this.insertRow = db
      .insert(journal)
      .values({
        dayId: sql.placeholder('dayId'),
        seq: sql.placeholder('seq'),
        at: sql.placeholder('at'),
        actorId: sql.placeholder('actorId'),
        actorName: sql.placeholder('actorName'),
        deviceId: sql.placeholder('deviceId'),
        type: sql.placeholder('type'),
        payload: sql.placeholder('payload'),
      })
      .prepare();
  }

  append(entry: JournalEntryInput): JournalEvent {
    const bumped = this.nextSeq.get({ dayId: entry.dayId });
    if (!bumped) throw new Error(`journal: no day ${entry.dayId}`);
    const row: JournalRow = {
      dayId: entry.dayId,
      seq: bumped.seq,
      at: entry.at,
      actorId: entry.actor?.userId ?? null,
      actorName: entry.actor?.name ?? 'Jarday',
      deviceId: entry.deviceId ?? '',
      type: entry.type,
      payload: entry.payload,
    };
    this.insertRow.run(row);
    return toEvent(row);
  }

  /** Entries after `sinceSeq`, oldest first, at most `limit`. */
  since(dayId: string, sinceSeq: number, limit: number): JournalEvent[] {
    return this.db
      .select()
      .from(journal)
      .where(and(eq(journal.dayId, dayId), gt(journal.seq, sinceSeq)))
      .orderBy(asc(journal.seq))
      .limit(limit)
      .all()
      .map(toEvent);
  }

  lastSeq(dayId: string): number {
    return this.db.select({ seq: days.lastSeq }).from(days).where(eq(days.id, dayId)).get()?.seq ?? 0;
  }
}
