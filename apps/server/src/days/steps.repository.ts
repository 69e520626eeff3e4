import type { StepMark } from '@jarday/contracts';
import { Injectable } from '@nestjs/common';
import { eq } from 'drizzle-orm';
import type { Db } from '../db/database.js';
import { InjectDb } from '../db/database.module.js';
import { steps } from '../db/schema/index.js';

type StepRow = typeof steps.$inferSelect;

const toMark = (r: StepRow): StepMark => ({
  subject: r.subject,
  subjectId: r.subjectId,
  step: r.step,
  done: r.done,
  at: r.at,
  by: { userId: r.byUserId, name: r.byName },
});

@Injectable()
export class StepsRepository {
  constructor(@InjectDb() private readonly db: Db) {}

  /** The latest word on a step wins: a tick, or an untick after a mistaken tap. */
  upsert(dayId: string, mark: StepMark): void {
    const row: StepRow = {
      dayId,
      subject: mark.subject,
      subjectId: mark.subjectId,
      step: mark.step,
      done: mark.done,
      at: mark.at,
      byUserId: mark.by.userId,
      byName: mark.by.name,
    };
    this.db
      .insert(steps)
      .values(row)
      .onConflictDoUpdate({ target: [steps.dayId, steps.subjectId, steps.step], set: row })
      .run();
  }

  listForDay(dayId: string): StepMark[] {
    return this.db.select().from(steps).where(eq(steps.dayId, dayId)).all().map(toMark);
  }
}
