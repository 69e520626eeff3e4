import { randomUUID } from 'node:crypto';
import type { ReminderKind } from '@jarday/contracts';
import { Injectable } from '@nestjs/common';
import { and, asc, count, eq, gt, inArray, isNotNull, isNull, sql } from 'drizzle-orm';
import type { Db } from '../db/database.js';
import { InjectDb } from '../db/database.module.js';
import { batches, days, kitchens, loads, memberships, reminders, sealChecks, users } from '../db/schema/index.js';

/** A lifted load the reminder rules look at, with what the mail needs to say about it. */
export interface ReminderLoad {
  loadId: string;
  dayId: string;
  kitchenId: string;
  kitchenName: string;
  dayDate: string;
  number: number;
  recipeName: string;
  liftedAt: Date;
  bandsOffAt: Date | null;
  /** Jars of this load marked "reprocess" at the seal check. */
  toReprocess: number;
  /** Whether a load already carries them again (a load with reprocess_of = this load). */
  reprocessed: boolean;
  /** Kinds already claimed for this load. */
  claimed: ReminderKind[];
}

@Injectable()
export class RemindersRepository {
  constructor(@InjectDb() private readonly db: Db) {}

  transaction<T>(fn: () => T): T {
    return this.db.transaction(() => fn());
  }

  /** Loads lifted after `since`, with the facts the reminder rules are made of. */
  liftedSince(since: Date): ReminderLoad[] {
    const rows = this.db
      .select({
        loadId: loads.id,
        dayId: loads.dayId,
        kitchenId: days.kitchenId,
        kitchenName: kitchens.name,
        dayDate: days.date,
        number: loads.number,
        recipeName: sql<string>`json_extract(${batches.recipe}, '$.name')`,
        liftedAt: loads.liftedAt,
        bandsOffAt: loads.bandsOffAt,
        toReprocess: sql<number>`(select count(*) from ${sealChecks} s where s.load_id = ${loads.id} and s.outcome = 'reprocess')`,
        reprocessed: sql<number>`exists (select 1 from ${loads} again where again.reprocess_of = ${loads.id})`,
        claimed: sql<string | null>`(select group_concat(r.kind) from ${reminders} r where r.load_id = ${loads.id})`,
      })
      .from(loads)
      .innerJoin(days, eq(days.id, loads.dayId))
      .innerJoin(kitchens, eq(kitchens.id, days.kitchenId))
      .innerJoin(batches, eq(batches.id, loads.batchId))
      .where(and(isNotNull(loads.liftedAt), gt(loads.liftedAt, since)))
      .all();
    return rows.map((r) => ({
      ...r,
      liftedAt: r.liftedAt!,
      reprocessed: Boolean(r.reprocessed),
      claimed: (r.claimed?.split(',') ?? []) as ReminderKind[],
    }));
  }

  /** The claim: false when this load's reminder of this kind was already claimed (by us or another process). */
  claim(row: { kitchenId: string; loadId: string; kind: ReminderKind; dueAt: Date; claimedAt: Date }): string | null {
    const id = randomUUID();
    const inserted = this.db
      .insert(reminders)
      .values({ id, ...row, sentAt: null, recipients: 0, note: null })
      .onConflictDoNothing({ target: [reminders.loadId, reminders.kind] })
      .run();
    return inserted.changes === 1 ? id : null;
  }

  settle(id: string, outcome: { sentAt: Date | null; recipients: number; note: string | null }): void {
    if (!this.db.$client.open) return;
    this.db.update(reminders).set(outcome).where(eq(reminders.id, id)).run();
  }

  /** Leads and helpers of the kitchen who keep reminders on. Watchers follow the board and are not asked to act. */
  recipients(kitchenId: string): { email: string; name: string }[] {
    return this.db
      .select({ email: users.email, name: users.name })
      .from(memberships)
      .innerJoin(users, eq(users.id, memberships.userId))
      .where(
        and(
          eq(memberships.kitchenId, kitchenId),
          eq(memberships.reminders, true),
          inArray(memberships.role, ['lead', 'helper']),
        ),
      )
      .orderBy(asc(users.email))
      .all();
  }

  /* ---------- the day summary ---------- */

  /** Everyone in the day's kitchen, whatever their role: the record of the day is for all of them. */
  dayMembers(dayId: string): { email: string }[] {
    return this.db
      .select({ email: users.email })
      .from(days)
      .innerJoin(memberships, eq(memberships.kitchenId, days.kitchenId))
      .innerJoin(users, eq(users.id, memberships.userId))
      .where(eq(days.id, dayId))
      .orderBy(asc(users.email))
      .all();
  }

  daySummary(dayId: string) {
    const day = this.db
      .select({ kitchenId: days.kitchenId, kitchenName: kitchens.name, date: days.date, title: days.title })
      .from(days)
      .innerJoin(kitchens, eq(kitchens.id, days.kitchenId))
      .where(eq(days.id, dayId))
      .get();
    if (!day) return undefined;
    const dayLoads = this.db
      .select({
        number: loads.number,
        recipeName: sql<string>`json_extract(${batches.recipe}, '$.name')`,
        jars: loads.jars,
      })
      .from(loads)
      .innerJoin(batches, eq(batches.id, loads.batchId))
      .where(eq(loads.dayId, dayId))
      .orderBy(asc(loads.number))
      .all();
    const seals = this.db
      .select({ checked: count(), sealed: sql<number>`coalesce(sum(${sealChecks.result} = 'sealed'), 0)` })
      .from(sealChecks)
      .where(eq(sealChecks.dayId, dayId))
      .get() ?? { checked: 0, sealed: 0 };
    return { ...day, loads: dayLoads, seals };
  }

  /** Rows claimed but never settled: what a crash between claim and send leaves behind. */
  countUnsettled(): number {
    return (
      this.db
        .select({ n: count() })
        .from(reminders)
        .where(and(isNull(reminders.sentAt), isNull(reminders.note)))
        .get()?.n ?? 0
    );
  }
}
