import { type Timer, timerSchema } from '@jarday/live';
import { Injectable } from '@nestjs/common';
import { and, asc, eq, isNotNull, sql } from 'drizzle-orm';
import type { Db } from '../db/database.js';
import { InjectDb } from '../db/database.module.js';
import { days, timers } from '../db/schema/index.js';

/** Timers are stored as their JSON document; `next_deadline_at` mirrors `deadlineAt` so a restart can find them. */
const p = sql.placeholder;

/**
 * Every tap runs these statements: they are prepared once, since building and preparing a query costs more than
 * running it (`npm run bench` shows the difference).
 */
function prepare(db: Db) {
  return {
    insert: db
      .insert(timers)
      .values({
        id: p('id'),
        dayId: p('dayId'),
        data: p('data'),
        nextDeadlineAt: p('nextDeadlineAt'),
        version: p('version'),
      })
      .prepare(),
    update: db
      .update(timers)
      // drizzle's update takes placeholders only as SQL, so the JSON is encoded here (see `update`).
      .set({ data: sql`${p('data')}`, nextDeadlineAt: sql`${p('nextDeadlineAt')}`, version: sql`${p('version')}` })
      .where(and(eq(timers.id, p('id')), eq(timers.version, p('readVersion'))))
      .prepare(),
    find: db
      .select({ data: timers.data })
      .from(timers)
      .where(and(eq(timers.dayId, p('dayId')), eq(timers.id, p('id'))))
      .prepare(),
    findById: db
      .select({ data: timers.data })
      .from(timers)
      .where(eq(timers.id, p('id')))
      .prepare(),
    dayStatus: db
      .select({ status: days.status })
      .from(days)
      .where(eq(days.id, p('id')))
      .prepare(),
  };
}

@Injectable()
export class TimersRepository {
  private readonly q: ReturnType<typeof prepare>;

  constructor(@InjectDb() private readonly db: Db) {
    this.q = prepare(db);
  }

  transaction<T>(fn: () => T): T {
    return this.db.transaction(() => fn());
  }

  insert(timer: Timer): void {
    this.q.insert.run({
      id: timer.id,
      dayId: timer.dayId,
      data: timer,
      nextDeadlineAt: timer.deadlineAt,
      version: timer.version,
    });
  }

  /** Optimistic write: only over the version it was read at. False when someone else wrote first. */
  update(timer: Timer, readVersion: number): boolean {
    const result = this.q.update.run({
      id: timer.id,
      readVersion,
      data: JSON.stringify(timer),
      nextDeadlineAt: timer.deadlineAt,
      version: timer.version,
    });
    return result.changes === 1;
  }

  find(dayId: string, timerId: string): Timer | undefined {
    const row = this.q.find.get({ dayId, id: timerId });
    return row ? (row.data as unknown as Timer) : undefined;
  }

  findById(timerId: string): Timer | undefined {
    const row = this.q.findById.get({ id: timerId });
    return row ? (row.data as unknown as Timer) : undefined;
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
    return this.q.dayStatus.get({ id: dayId })?.status;
  }
}
