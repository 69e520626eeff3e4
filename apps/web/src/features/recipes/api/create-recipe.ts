import type { RecipeData, RecipeView } from '@jarday/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { kitchenRecipesPath, recipeKeys } from './recipe-keys';

/** POST /api/kitchens/:kitchenId/recipes (lead only). */
export function createRecipe(kitchenId: string, input: RecipeData): Promise<RecipeView> {
  return api.post<RecipeView>(kitchenRecipesPath(kitchenId), input);
}

export function useCreateRecipe(kitchenId: string, options: { onSuccess?: (recipe: RecipeView) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: RecipeData) => createRecipe(kitchenId, input),
    onSuccess: async (recipe) => {
      queryClient.setQueryData(recipeKeys.detail(kitchenId, recipe.id), recipe);
      await queryClient.invalidateQueries({ queryKey: recipeKeys.list(kitchenId) });
      options.onSuccess?.(recipe);
    },
  });
}
