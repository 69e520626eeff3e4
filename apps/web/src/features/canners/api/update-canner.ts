import type { CannerView, UpdateCannerInput } from '@jarday/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { cannerKeys } from './canner-keys';

/** PUT /api/kitchens/:kitchenId/canners/:cannerId (lead only): the canner is replaced whole. */
export function updateCanner(kitchenId: string, cannerId: string, input: UpdateCannerInput): Promise<CannerView> {
  return api.put<CannerView>(
    `/kitchens/${encodeURIComponent(kitchenId)}/canners/${encodeURIComponent(cannerId)}`,
    input,
  );
}

export function useUpdateCanner(kitchenId: string, options: { onSuccess?: (canner: CannerView) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ cannerId, input }: { cannerId: string; input: UpdateCannerInput }) =>
      updateCanner(kitchenId, cannerId, input),
    onSuccess: async (canner) => {
      await queryClient.invalidateQueries({ queryKey: cannerKeys.list(kitchenId) });
      options.onSuccess?.(canner);
    },
  });
}
