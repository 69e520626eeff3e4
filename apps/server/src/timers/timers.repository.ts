import { type Timer, timerSchema } from '@jarday/live';
import { Injectable } from '@nestjs/common';
import { and, asc, eq, isNotNull, sql } from 'drizzle-orm';
import type { Db } from '../db/database.js';
import { InjectDb } from '../db/database.module.js';
import { commandLedger, days, timers } from '../db/schema/index.js';

export interface LedgerRow<TAnswer = unknown> {
  commandId: string;
  fingerprint: string;
  answer: TAnswer;
}

/** Timers are stored as their JSON document; `next_deadline_at` mirrors `deadlineAt` so a restart can find them. */
@Injectable()
export class TimersRepository {
  constructor(@InjectDb() private readonly db: Db) {}

  transaction<T>(fn: () => T): T {
    return this.db.transaction(() => fn());
  }

  insert(timer: Timer): void {
    this.db
      .insert(timers)
      .values({
        id: timer.id,
        dayId: timer.dayId,
        data: { ...timer },
        nextDeadlineAt: timer.deadlineAt,
        version: timer.version,
      })
      .run();
  }

  /** Optimistic write: only over the version it was read at. False when someone else wrote first. */
  update(timer: Timer, readVersion: number): boolean {
    return (
      this.db
        .update(timers)
        .set({ data: { ...timer }, nextDeadlineAt: timer.deadlineAt, version: timer.version })
        .where(and(eq(timers.id, timer.id), eq(timers.version, readVersion)))
        .run().changes === 1
    );
  }

  find(dayId: string, timerId: string): Timer | undefined {
    const row = this.db
      .select({ data: timers.data })
      .from(timers)
      .where(and(eq(timers.dayId, dayId), eq(timers.id, timerId)))
      .get();
    return row ? timerSchema.parse(row.data) : undefined;
  }

  findById(timerId: string): Timer | undefined {
    const row = this.db.select({ data: timers.data }).from(timers).where(eq(timers.id, timerId)).get();
    return row ? timerSchema.parse(row.data) : undefined;
  }

  listForDay(dayId: string): Timer[] {
    return this.db
      .select({ data: timers.data })
      .from(timers)
      .where(eq(timers.dayId, dayId))
      .orderBy(sql`rowid`)
      .all()
      .map((r) => timerSchema.parse(r.data));
  }

  /** Every timer with a clock counting, whatever its day: what the server must re-arm at start-up. */
  listCounting(): Timer[] {
    return this.db
      .select({ data: timers.data })
      .from(timers)
      .where(isNotNull(timers.nextDeadlineAt))
      .orderBy(asc(timers.nextDeadlineAt))
      .all()
      .map((r) => timerSchema.parse(r.data));
  }

  dayStatus(dayId: string): 'open' | 'closed' | undefined {
    return this.db.select({ status: days.status }).from(days).where(eq(days.id, dayId)).get()?.status;
  }

  /** The ledger row of a command id; its answer is what this server stored for it. */
  findLedger<TAnswer>(commandId: string): LedgerRow<TAnswer> | undefined {
    const row = this.db.select().from(commandLedger).where(eq(commandLedger.commandId, commandId)).get();
    if (!row) return undefined;
    const stored = row.answer as { fingerprint: string; answer: TAnswer };
    return { commandId: row.commandId, fingerprint: stored.fingerprint, answer: stored.answer };
  }

  insertLedger(dayId: string, userId: string, entry: LedgerRow, at: number): void {
    this.db
      .insert(commandLedger)
      .values({
        commandId: entry.commandId,
        dayId,
        userId,
        answer: { fingerprint: entry.fingerprint, answer: entry.answer },
        at,
      })
      .run();
  }
}
