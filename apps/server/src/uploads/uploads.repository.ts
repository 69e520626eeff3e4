import type { AttachmentSubject } from '@jarday/contracts';
import { Injectable } from '@nestjs/common';
import { and, asc, eq } from 'drizzle-orm';
import type { Db } from '../db/database.js';
import { InjectDb } from '../db/database.module.js';
import { attachments, days, loads, lots, recipes, users } from '../db/schema/index.js';

export type AttachmentRow = typeof attachments.$inferSelect;
export type AttachmentWithName = AttachmentRow & { uploadedByName: string | null };

@Injectable()
export class UploadsRepository {
  constructor(@InjectDb() private readonly db: Db) {}

  transaction<T>(fn: () => T): T {
    return this.db.transaction(() => fn());
  }

  /** Whether the day, load, lot or recipe exists in this kitchen (a load belongs to a kitchen through its day). */
  subjectExists(kitchenId: string, subject: AttachmentSubject, id: string): boolean {
    const found = (() => {
      switch (subject) {
        case 'day':
          return this.db
            .select({ id: days.id })
            .from(days)
            .where(and(eq(days.id, id), eq(days.kitchenId, kitchenId)))
            .get();
        case 'load':
          return this.db
            .select({ id: loads.id })
            .from(loads)
            .innerJoin(days, eq(days.id, loads.dayId))
            .where(and(eq(loads.id, id), eq(days.kitchenId, kitchenId)))
            .get();
        case 'lot':
          return this.db
            .select({ id: lots.id })
            .from(lots)
            .where(and(eq(lots.id, id), eq(lots.kitchenId, kitchenId)))
            .get();
        case 'recipe':
          return this.db
            .select({ id: recipes.id })
            .from(recipes)
            .where(and(eq(recipes.id, id), eq(recipes.kitchenId, kitchenId)))
            .get();
      }
    })();
    return found !== undefined;
  }

  insert(row: AttachmentRow): void {
    this.db.insert(attachments).values(row).run();
  }

  private selectWithName() {
    return this.db
      .select({ attachment: attachments, uploadedByName: users.name })
      .from(attachments)
      .leftJoin(users, eq(users.id, attachments.uploadedBy));
  }

  list(kitchenId: string, subject: AttachmentSubject, subjectId: string): AttachmentWithName[] {
    return this.selectWithName()
      .where(
        and(
          eq(attachments.kitchenId, kitchenId),
          eq(attachments.subject, subject),
          eq(attachments.subjectId, subjectId),
        ),
      )
      .orderBy(asc(attachments.createdAt), asc(attachments.id))
      .all()
      .map((r) => ({ ...r.attachment, uploadedByName: r.uploadedByName }));
  }

  /** Only within the kitchen: another kitchen's attachment is not found, whoever asks. */
  find(kitchenId: string, id: string): AttachmentWithName | undefined {
    const r = this.selectWithName()
      .where(and(eq(attachments.kitchenId, kitchenId), eq(attachments.id, id)))
      .get();
    return r && { ...r.attachment, uploadedByName: r.uploadedByName };
  }

  delete(kitchenId: string, id: string): boolean {
    return (
      this.db
        .delete(attachments)
        .where(and(eq(attachments.kitchenId, kitchenId), eq(attachments.id, id)))
        .run().changes === 1
    );
  }
}
