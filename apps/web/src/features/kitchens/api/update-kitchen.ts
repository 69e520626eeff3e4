import type { KitchenView, UpdateKitchenInput } from '@jarday/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { kitchenKeys } from './kitchen-keys';

/** PATCH /api/kitchens/:kitchenId (lead only). */
export function updateKitchen(kitchenId: string, input: UpdateKitchenInput): Promise<KitchenView> {
  return api.patch<KitchenView>(`/kitchens/${encodeURIComponent(kitchenId)}`, input);
}

export function useUpdateKitchen(kitchenId: string, options: { onSuccess?: (kitchen: KitchenView) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateKitchenInput) => updateKitchen(kitchenId, input),
    onSuccess: async (kitchen) => {
      queryClient.setQueryData(kitchenKeys.detail(kitchenId), kitchen);
      await queryClient.invalidateQueries({ queryKey: kitchenKeys.list() });
      options.onSuccess?.(kitchen);
    },
  });
}
