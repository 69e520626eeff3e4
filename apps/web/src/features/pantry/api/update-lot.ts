import type { LotView, UpdateLotInput } from '@jarday/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { lotPath, pantryKeys } from './pantry-keys';

/** PATCH /api/kitchens/:kitchenId/lots/:lotId (lead, helper): where the lot's jars are kept. */
export function updateLot(kitchenId: string, lotId: string, input: UpdateLotInput): Promise<LotView> {
  return api.patch<LotView>(lotPath(kitchenId, lotId), input);
}

export function useUpdateLot(kitchenId: string, lotId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateLotInput) => updateLot(kitchenId, lotId, input),
    onSuccess: async (lot) => {
      queryClient.setQueryData(pantryKeys.detail(kitchenId, lotId), lot);
      await queryClient.invalidateQueries({ queryKey: pantryKeys.lists(kitchenId) });
    },
  });
}
