import { Injectable } from '@nestjs/common';
import { and, desc, eq, gt, isNull } from 'drizzle-orm';
import type { Db } from '../db/database.js';
import { InjectDb } from '../db/database.module.js';
import { invites, users } from '../db/schema/index.js';

export type InviteRow = typeof invites.$inferSelect;

const open = (now: Date) => and(isNull(invites.redeemedAt), isNull(invites.revokedAt), gt(invites.expiresAt, now));

@Injectable()
export class InvitesRepository {
  constructor(@InjectDb() private readonly db: Db) {}

  /** False when the code is already taken (the unique index decides). */
  insert(row: InviteRow): boolean {
    return this.db.insert(invites).values(row).onConflictDoNothing({ target: invites.code }).run().changes === 1;
  }

  listOpen(kitchenId: string, now: Date) {
    return this.db
      .select({ invite: invites, createdByName: users.name })
      .from(invites)
      .innerJoin(users, eq(users.id, invites.createdBy))
      .where(and(eq(invites.kitchenId, kitchenId), open(now)))
      .orderBy(desc(invites.createdAt))
      .all();
  }

  findOpenByCode(code: string, now: Date): InviteRow | undefined {
    return this.db
      .select()
      .from(invites)
      .where(and(eq(invites.code, code), open(now)))
      .get();
  }

  findCreatorName(invite: InviteRow): string {
    return this.db.select({ name: users.name }).from(users).where(eq(users.id, invite.createdBy)).get()?.name ?? '';
  }

  /** Marks an open invite used; false when it was used, revoked or expired meanwhile. */
  markRedeemed(id: string, userId: string, now: Date): boolean {
    return (
      this.db
        .update(invites)
        .set({ redeemedBy: userId, redeemedAt: now })
        .where(and(eq(invites.id, id), open(now)))
        .run().changes === 1
    );
  }

  revoke(kitchenId: string, id: string, now: Date): boolean {
    return (
      this.db
        .update(invites)
        .set({ revokedAt: now })
        .where(and(eq(invites.id, id), eq(invites.kitchenId, kitchenId), open(now)))
        .run().changes === 1
    );
  }
}
