import type { CannerView, CreateCannerInput } from '@jarday/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { cannerKeys } from './canner-keys';

/** POST /api/kitchens/:kitchenId/canners (lead only). */
export function createCanner(kitchenId: string, input: CreateCannerInput): Promise<CannerView> {
  return api.post<CannerView>(`/kitchens/${encodeURIComponent(kitchenId)}/canners`, input);
}

export function useCreateCanner(kitchenId: string, options: { onSuccess?: (canner: CannerView) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateCannerInput) => createCanner(kitchenId, input),
    onSuccess: async (canner) => {
      await queryClient.invalidateQueries({ queryKey: cannerKeys.list(kitchenId) });
      options.onSuccess?.(canner);
    },
  });
}
