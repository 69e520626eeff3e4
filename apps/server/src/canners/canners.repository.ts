import { Injectable } from '@nestjs/common';
import { and, asc, eq } from 'drizzle-orm';
import type { Db } from '../db/database.js';
import { InjectDb } from '../db/database.module.js';
import { canners } from '../db/schema/index.js';

export type CannerRow = typeof canners.$inferSelect;

@Injectable()
export class CannersRepository {
  constructor(@InjectDb() private readonly db: Db) {}

  list(kitchenId: string): CannerRow[] {
    return this.db.select().from(canners).where(eq(canners.kitchenId, kitchenId)).orderBy(asc(canners.name)).all();
  }

  find(kitchenId: string, id: string): CannerRow | undefined {
    return this.db
      .select()
      .from(canners)
      .where(and(eq(canners.kitchenId, kitchenId), eq(canners.id, id)))
      .get();
  }

  insert(row: CannerRow): void {
    this.db.insert(canners).values(row).run();
  }

  update(
    kitchenId: string,
    id: string,
    patch: Pick<CannerRow, 'name' | 'method' | 'gauge' | 'capacity' | 'waterLitres' | 'burnerWatts'>,
  ): boolean {
    return (
      this.db
        .update(canners)
        .set(patch)
        .where(and(eq(canners.kitchenId, kitchenId), eq(canners.id, id)))
        .run().changes === 1
    );
  }

  delete(kitchenId: string, id: string): boolean {
    return (
      this.db
        .delete(canners)
        .where(and(eq(canners.kitchenId, kitchenId), eq(canners.id, id)))
        .run().changes === 1
    );
  }
}
