import { isDeepStrictEqual } from 'node:util';
import { randomUUID } from 'node:crypto';
import {
  type PlanAnswer,
  type PlanQuery,
  type RecipeData,
  type RecipeSaveNotice,
  type RecipeView,
  rulesOf,
} from '@jarday/contracts';
import { planCautions, planProcess } from '@jarday/rules';
import { Injectable } from '@nestjs/common';
import { notFound } from '../common/app-error.js';
import { CannersRepository } from '../canners/canners.repository.js';
import { KitchensRepository } from '../kitchens/kitchens.repository.js';
import { type RecipeRow, RecipesRepository } from './recipes.repository.js';
import { findStarter, STARTER_RECIPES } from './starter-recipes.js';

const toView = (r: RecipeRow): RecipeView => ({
  ...r.data,
  id: r.id,
  kitchenId: r.kitchenId,
  copiedFrom: r.copiedFrom,
  createdAt: r.createdAt.toISOString(),
  updatedAt: r.updatedAt.toISOString(),
});

export const UNTESTED_AFTER_EDIT =
  'The process times were changed, so this is no longer the tested recipe. It is marked untested.';

@Injectable()
export class RecipesService {
  constructor(
    private readonly recipes: RecipesRepository,
    private readonly kitchens: KitchensRepository,
    private readonly canners: CannersRepository,
  ) {}

  starters(): readonly RecipeView[] {
    return STARTER_RECIPES;
  }

  starter(id: string): RecipeView {
    const starter = findStarter(id);
    if (!starter) throw notFound('Recipe');
    return starter;
  }

  list(kitchenId: string): RecipeView[] {
    return this.recipes.list(kitchenId).map(toView);
  }

  get(kitchenId: string, id: string): RecipeView {
    const row = this.recipes.find(kitchenId, id);
    if (!row) throw notFound('Recipe');
    return toView(row);
  }

  create(
    kitchenId: string,
    userId: string,
    data: RecipeData,
    copiedFrom: string | null = null,
    now = new Date(),
  ): RecipeView {
    const row: RecipeRow = {
      id: randomUUID(),
      kitchenId,
      name: data.name,
      data,
      copiedFrom,
      createdBy: userId,
      createdAt: now,
      updatedAt: now,
    };
    this.recipes.insert(row);
    return toView(row);
  }

  /** Copies a starter, or another recipe of the same kitchen, into the kitchen's own box. */
  copy(kitchenId: string, userId: string, sourceId: string): RecipeView {
    const source = findStarter(sourceId) ?? this.get(kitchenId, sourceId);
    const { id: _id, kitchenId: _k, copiedFrom: _c, createdAt: _a, updatedAt: _u, ...data } = source;
    return this.create(kitchenId, userId, data, source.id);
  }

  /**
   * Saves an edit. A tested recipe whose process table changed is no longer the tested recipe: it is marked
   * untested whatever the edit claims, and the answer says why.
   */
  replace(
    kitchenId: string,
    id: string,
    data: RecipeData,
    now = new Date(),
  ): { recipe: RecipeView; notice: RecipeSaveNotice } {
    const current = this.recipes.find(kitchenId, id);
    if (!current) throw notFound('Recipe');
    const timesChanged = !isDeepStrictEqual(current.data.processing, data.processing);
    const untested = current.data.tested && timesChanged;
    const saved: RecipeData = untested ? { ...data, tested: false } : data;
    this.recipes.update(kitchenId, id, { name: saved.name, data: saved, updatedAt: now });
    return { recipe: this.get(kitchenId, id), notice: { untestedBecause: untested ? UNTESTED_AFTER_EDIT : null } };
  }

  remove(kitchenId: string, id: string): void {
    if (!this.recipes.delete(kitchenId, id)) throw notFound('Recipe');
  }

  /** The process plan for a recipe at the kitchen's altitude in one of its canners, with the cautions to show. */
  plan(kitchenId: string, recipeId: string, query: PlanQuery): PlanAnswer {
    const recipe = this.get(kitchenId, recipeId);
    const kitchen = this.kitchens.findKitchen(kitchenId);
    const canner = this.canners.find(kitchenId, query.cannerId);
    if (!kitchen) throw notFound('Kitchen');
    if (!canner) throw notFound('Canner');
    const result = planProcess({
      recipe: rulesOf(recipe),
      jarSize: query.jarSize,
      pack: query.pack,
      altitude: { value: kitchen.altitudeValue, unit: kitchen.altitudeUnit },
      canner,
    });
    if (!result.ok) return result;
    return {
      ok: true,
      plan: result.plan,
      cautions: planCautions(result.plan.cautionIds, { isSalsa: recipe.category === 'salsa' }),
    };
  }
}
