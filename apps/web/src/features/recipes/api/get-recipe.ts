import type { RecipeView } from '@jarday/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { recipeKeys, recipePath } from './recipe-keys';

/** GET /api/kitchens/:kitchenId/recipes/:recipeId (any member); 404 for a recipe of another kitchen. */
export function getRecipe(kitchenId: string, recipeId: string): Promise<RecipeView> {
  return api.get<RecipeView>(recipePath(kitchenId, recipeId));
}

export const recipeQueryOptions = (kitchenId: string, recipeId: string) =>
  queryOptions({ queryKey: recipeKeys.detail(kitchenId, recipeId), queryFn: () => getRecipe(kitchenId, recipeId) });

export const useRecipe = (kitchenId: string, recipeId: string) => useQuery(recipeQueryOptions(kitchenId, recipeId));
