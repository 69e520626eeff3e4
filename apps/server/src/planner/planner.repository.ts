import { Injectable } from '@nestjs/common';
import { and, asc, eq, inArray, sql } from 'drizzle-orm';
import type { Db } from '../db/database.js';
import { InjectDb } from '../db/database.module.js';
import { days, journal, loads } from '../db/schema/index.js';

const LID_ON = 'timer.heating';
const ROLLING_BOIL = 'timer.boil-confirmed';

/** The journal read the way the planner needs it: how long each canner took from lid on to a rolling boil. */
@Injectable()
export class PlannerRepository {
  constructor(@InjectDb() private readonly db: Db) {}

  /**
   * Past come-ups per canner, in ms: for each load's process timer, from its `timer.heating` entry (lid on, water
   * heating) to its first `timer.boil-confirmed` entry. A boil lost and found again later does not count twice.
   */
  comeUpHistory(kitchenId: string, cannerIds: readonly string[]): Map<string, number[]> {
    const history = new Map<string, number[]>(cannerIds.map((id) => [id, []]));
    if (cannerIds.length === 0) return history;
    const timerId = sql<string>`json_extract(${journal.payload}, '$.timerId')`;
    const rows = this.db
      .select({ cannerId: loads.cannerId, timerId, type: journal.type, at: journal.at })
      .from(journal)
      .innerJoin(days, eq(days.id, journal.dayId))
      .innerJoin(loads, eq(loads.id, sql`json_extract(${journal.payload}, '$.timer.loadId')`))
      .where(
        and(
          eq(days.kitchenId, kitchenId),
          inArray(loads.cannerId, [...cannerIds]),
          inArray(journal.type, [LID_ON, ROLLING_BOIL]),
        ),
      )
      .orderBy(asc(journal.dayId), asc(journal.seq))
      .all();
    const timers = new Map<string, { cannerId: string; lidOnAt?: number; boilAt?: number }>();
    for (const row of rows) {
      if (row.cannerId === null) continue;
      const t = timers.get(row.timerId) ?? { cannerId: row.cannerId };
      if (row.type === LID_ON) t.lidOnAt ??= row.at;
      else if (t.lidOnAt !== undefined) t.boilAt ??= row.at;
      timers.set(row.timerId, t);
    }
    for (const t of timers.values()) {
      if (t.lidOnAt !== undefined && t.boilAt !== undefined) history.get(t.cannerId)?.push(t.boilAt - t.lidOnAt);
    }
    return history;
  }
}
