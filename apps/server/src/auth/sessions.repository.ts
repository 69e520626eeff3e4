import { Injectable } from '@nestjs/common';
import { and, eq, gt, isNull } from 'drizzle-orm';
import type { Db } from '../db/database.js';
import { InjectDb } from '../db/database.module.js';
import { sessions } from '../db/schema/index.js';

export type SessionRow = typeof sessions.$inferSelect;

@Injectable()
export class SessionsRepository {
  constructor(@InjectDb() private readonly db: Db) {}

  insert(row: SessionRow): void {
    this.db.insert(sessions).values(row).run();
  }

  findLive(tokenHash: string, now: Date): SessionRow | undefined {
    return this.db
      .select()
      .from(sessions)
      .where(and(eq(sessions.tokenHash, tokenHash), isNull(sessions.revokedAt), gt(sessions.expiresAt, now)))
      .get();
  }

  /** Swaps the token of a live session; false when another request rotated it first. */
  rotate(id: string, oldHash: string, newHash: string, now: Date, expiresAt: Date): boolean {
    const result = this.db
      .update(sessions)
      .set({ tokenHash: newHash, lastUsedAt: now, expiresAt })
      .where(and(eq(sessions.id, id), eq(sessions.tokenHash, oldHash), isNull(sessions.revokedAt)))
      .run();
    return result.changes === 1;
  }

  revokeByHash(tokenHash: string, now: Date): void {
    this.db.update(sessions).set({ revokedAt: now }).where(eq(sessions.tokenHash, tokenHash)).run();
  }
}
