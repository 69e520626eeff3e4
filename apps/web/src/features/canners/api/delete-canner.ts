import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { cannerKeys } from './canner-keys';

/** DELETE /api/kitchens/:kitchenId/canners/:cannerId (lead only). */
export function deleteCanner(kitchenId: string, cannerId: string): Promise<void> {
  return api.delete(`/kitchens/${encodeURIComponent(kitchenId)}/canners/${encodeURIComponent(cannerId)}`);
}

export function useDeleteCanner(kitchenId: string, options: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (cannerId: string) => deleteCanner(kitchenId, cannerId),
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: cannerKeys.list(kitchenId) });
      options.onSuccess?.();
    },
  });
}
