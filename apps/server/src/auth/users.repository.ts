import { Injectable } from '@nestjs/common';
import { eq } from 'drizzle-orm';
import type { Db } from '../db/database.js';
import { InjectDb } from '../db/database.module.js';
import { users } from '../db/schema/index.js';

export type UserRow = typeof users.$inferSelect;

@Injectable()
export class UsersRepository {
  constructor(@InjectDb() private readonly db: Db) {}

  findByEmail(email: string): UserRow | undefined {
    return this.db.select().from(users).where(eq(users.email, email)).get();
  }

  findById(id: string): UserRow | undefined {
    return this.db.select().from(users).where(eq(users.id, id)).get();
  }

  /** Returns false when the e-mail is taken (the unique index decides, so two racing sign-ups cannot both win). */
  insert(row: UserRow): boolean {
    const result = this.db.insert(users).values(row).onConflictDoNothing({ target: users.email }).run();
    return result.changes === 1;
  }
}
