import type { CreateKitchenInput, KitchenView } from '@jarday/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { kitchenKeys } from './kitchen-keys';

/** POST /api/kitchens: I become its lead. */
export function createKitchen(input: CreateKitchenInput): Promise<KitchenView> {
  return api.post<KitchenView>('/kitchens', input);
}

export function useCreateKitchen(options: { onSuccess?: (kitchen: KitchenView) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createKitchen,
    onSuccess: async (kitchen) => {
      queryClient.setQueryData(kitchenKeys.detail(kitchen.id), kitchen);
      await queryClient.invalidateQueries({ queryKey: kitchenKeys.list() });
      options.onSuccess?.(kitchen);
    },
  });
}
