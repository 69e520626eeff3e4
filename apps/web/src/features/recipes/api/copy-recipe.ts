import type { RecipeView } from '@jarday/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { kitchenRecipesPath, recipeKeys } from './recipe-keys';

/** POST /api/kitchens/:kitchenId/recipes/copy (lead only): a starter, or one of the kitchen's recipes, copied in. */
export function copyRecipe(kitchenId: string, recipeId: string): Promise<RecipeView> {
  return api.post<RecipeView>(`${kitchenRecipesPath(kitchenId)}/copy`, { recipeId });
}

export function useCopyRecipe(kitchenId: string, options: { onSuccess?: (recipe: RecipeView) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (recipeId: string) => copyRecipe(kitchenId, recipeId),
    onSuccess: async (recipe) => {
      queryClient.setQueryData(recipeKeys.detail(kitchenId, recipe.id), recipe);
      await queryClient.invalidateQueries({ queryKey: recipeKeys.list(kitchenId) });
      options.onSuccess?.(recipe);
    },
  });
}
