import type { Role } from '@jarday/contracts';
import { Injectable } from '@nestjs/common';
import { and, asc, count, eq, sql } from 'drizzle-orm';
import type { Db } from '../db/database.js';
import { InjectDb } from '../db/database.module.js';
import { kitchens, memberships, users } from '../db/schema/index.js';

export type KitchenRow = typeof kitchens.$inferSelect;
export type MembershipRow = typeof memberships.$inferSelect;
export interface KitchenWithRole extends KitchenRow {
  role: Role;
  memberCount: number;
}

const memberCount = sql<number>`(select count(*) from ${memberships} m where m.kitchen_id = ${kitchens.id})`;

@Injectable()
export class KitchensRepository {
  /** Asked on every request and every live command: prepared once. */
  private readonly membership;

  constructor(@InjectDb() private readonly db: Db) {
    this.membership = db
      .select()
      .from(memberships)
      .where(
        and(eq(memberships.kitchenId, sql.placeholder('kitchenId')), eq(memberships.userId, sql.placeholder('userId'))),
      )
      .prepare();
  }

  /** Runs `fn` in one SQLite transaction (better-sqlite3 transactions are synchronous). */
  transaction<T>(fn: () => T): T {
    return this.db.transaction(() => fn());
  }

  insertKitchen(row: KitchenRow): void {
    this.db.insert(kitchens).values(row).run();
  }

  updateKitchen(id: string, patch: Partial<Omit<KitchenRow, 'id' | 'createdAt'>>): void {
    this.db.update(kitchens).set(patch).where(eq(kitchens.id, id)).run();
  }

  findForUser(kitchenId: string, userId: string): KitchenWithRole | undefined {
    return this.db
      .select({ ...kitchenColumns, role: memberships.role, memberCount })
      .from(kitchens)
      .innerJoin(memberships, eq(memberships.kitchenId, kitchens.id))
      .where(and(eq(kitchens.id, kitchenId), eq(memberships.userId, userId)))
      .get();
  }

  listForUser(userId: string): KitchenWithRole[] {
    return this.db
      .select({ ...kitchenColumns, role: memberships.role, memberCount })
      .from(kitchens)
      .innerJoin(memberships, eq(memberships.kitchenId, kitchens.id))
      .where(eq(memberships.userId, userId))
      .orderBy(asc(kitchens.name))
      .all();
  }

  findKitchen(kitchenId: string): KitchenRow | undefined {
    return this.db.select().from(kitchens).where(eq(kitchens.id, kitchenId)).get();
  }

  findKitchenName(kitchenId: string): string | undefined {
    return this.db.select({ name: kitchens.name }).from(kitchens).where(eq(kitchens.id, kitchenId)).get()?.name;
  }

  findMembership(kitchenId: string, userId: string): MembershipRow | undefined {
    return this.membership.get({ kitchenId, userId });
  }

  insertMembership(row: MembershipRow): void {
    this.db.insert(memberships).values(row).run();
  }

  setRole(kitchenId: string, userId: string, role: Role): void {
    this.db
      .update(memberships)
      .set({ role })
      .where(and(eq(memberships.kitchenId, kitchenId), eq(memberships.userId, userId)))
      .run();
  }

  setReminders(kitchenId: string, userId: string, reminders: boolean): void {
    this.db
      .update(memberships)
      .set({ reminders })
      .where(and(eq(memberships.kitchenId, kitchenId), eq(memberships.userId, userId)))
      .run();
  }

  deleteMembership(kitchenId: string, userId: string): void {
    this.db
      .delete(memberships)
      .where(and(eq(memberships.kitchenId, kitchenId), eq(memberships.userId, userId)))
      .run();
  }

  countLeads(kitchenId: string): number {
    const row = this.db
      .select({ n: count() })
      .from(memberships)
      .where(and(eq(memberships.kitchenId, kitchenId), eq(memberships.role, 'lead')))
      .get();
    return row?.n ?? 0;
  }

  listMembers(kitchenId: string) {
    return this.db
      .select({
        userId: memberships.userId,
        role: memberships.role,
        joinedAt: memberships.joinedAt,
        name: users.name,
        email: users.email,
      })
      .from(memberships)
      .innerJoin(users, eq(users.id, memberships.userId))
      .where(eq(memberships.kitchenId, kitchenId))
      .orderBy(asc(users.name))
      .all();
  }
}

const kitchenColumns = {
  id: kitchens.id,
  name: kitchens.name,
  altitudeValue: kitchens.altitudeValue,
  altitudeUnit: kitchens.altitudeUnit,
  units: kitchens.units,
  createdAt: kitchens.createdAt,
};
