import type { RecipeData, RecipeSaveNotice, RecipeView } from '@jarday/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { recipeKeys, recipePath } from './recipe-keys';

export interface RecipeSaved {
  recipe: RecipeView;
  /** Says why a tested recipe is now marked untested (its process times changed), or null. */
  notice: RecipeSaveNotice;
}

/** PUT /api/kitchens/:kitchenId/recipes/:recipeId (lead only): the recipe is replaced whole. */
export function updateRecipe(kitchenId: string, recipeId: string, input: RecipeData): Promise<RecipeSaved> {
  return api.put<RecipeSaved>(recipePath(kitchenId, recipeId), input);
}

export function useUpdateRecipe(kitchenId: string, options: { onSuccess?: (saved: RecipeSaved) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ recipeId, input }: { recipeId: string; input: RecipeData }) =>
      updateRecipe(kitchenId, recipeId, input),
    onSuccess: async (saved) => {
      queryClient.setQueryData(recipeKeys.detail(kitchenId, saved.recipe.id), saved.recipe);
      // The list, and every plan of this recipe, may have changed with the times.
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: recipeKeys.list(kitchenId) }),
        queryClient.invalidateQueries({ queryKey: recipeKeys.plans(kitchenId, saved.recipe.id) }),
      ]);
      options.onSuccess?.(saved);
    },
  });
}
