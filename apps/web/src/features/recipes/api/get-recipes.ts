import type { RecipeView } from '@jarday/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { kitchenRecipesPath, recipeKeys } from './recipe-keys';

/** GET /api/kitchens/:kitchenId/recipes (any member). */
export function getRecipes(kitchenId: string): Promise<RecipeView[]> {
  return api.get<RecipeView[]>(kitchenRecipesPath(kitchenId));
}

export const recipesQueryOptions = (kitchenId: string) =>
  queryOptions({ queryKey: recipeKeys.list(kitchenId), queryFn: () => getRecipes(kitchenId) });

export const useRecipes = (kitchenId: string) => useQuery(recipesQueryOptions(kitchenId));
