import { Injectable } from '@nestjs/common';
import { and, asc, eq } from 'drizzle-orm';
import type { Db } from '../db/database.js';
import { InjectDb } from '../db/database.module.js';
import { recipes } from '../db/schema/index.js';

export type RecipeRow = typeof recipes.$inferSelect;

@Injectable()
export class RecipesRepository {
  constructor(@InjectDb() private readonly db: Db) {}

  list(kitchenId: string): RecipeRow[] {
    return this.db.select().from(recipes).where(eq(recipes.kitchenId, kitchenId)).orderBy(asc(recipes.name)).all();
  }

  find(kitchenId: string, id: string): RecipeRow | undefined {
    return this.db
      .select()
      .from(recipes)
      .where(and(eq(recipes.kitchenId, kitchenId), eq(recipes.id, id)))
      .get();
  }

  insert(row: RecipeRow): void {
    this.db.insert(recipes).values(row).run();
  }

  update(kitchenId: string, id: string, patch: Pick<RecipeRow, 'name' | 'data' | 'updatedAt'>): boolean {
    return (
      this.db
        .update(recipes)
        .set(patch)
        .where(and(eq(recipes.kitchenId, kitchenId), eq(recipes.id, id)))
        .run().changes === 1
    );
  }

  delete(kitchenId: string, id: string): boolean {
    return (
      this.db
        .delete(recipes)
        .where(and(eq(recipes.kitchenId, kitchenId), eq(recipes.id, id)))
        .run().changes === 1
    );
  }
}
