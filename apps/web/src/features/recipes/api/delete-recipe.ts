import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { recipeKeys, recipePath } from './recipe-keys';

/** DELETE /api/kitchens/:kitchenId/recipes/:recipeId (lead only). */
export function deleteRecipe(kitchenId: string, recipeId: string): Promise<void> {
  return api.delete(recipePath(kitchenId, recipeId));
}

export function useDeleteRecipe(kitchenId: string, options: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (recipeId: string) => deleteRecipe(kitchenId, recipeId),
    // The recipe's own query is only marked stale, not refetched or removed: either, while its page is still on
    // screen, would flash "not found" before the page moves on. A later visit then finds it gone.
    onSuccess: async (_data, recipeId) => {
      await queryClient.invalidateQueries({ queryKey: recipeKeys.detail(kitchenId, recipeId), refetchType: 'none' });
      await queryClient.invalidateQueries({ queryKey: recipeKeys.list(kitchenId) });
      options.onSuccess?.();
    },
  });
}
