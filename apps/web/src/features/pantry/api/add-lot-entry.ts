import type { CreateLotEntryInput, LotEntryAnswer } from '@jarday/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { lotPath, pantryKeys } from './pantry-keys';

/**
 * POST /api/kitchens/:kitchenId/lots/:lotId/entries (lead, helper): jars eaten, given away or reported spoiled. A
 * spoilage report flags the lot, and the answer carries the caution to show.
 */
export function addLotEntry(kitchenId: string, lotId: string, input: CreateLotEntryInput): Promise<LotEntryAnswer> {
  return api.post<LotEntryAnswer>(`${lotPath(kitchenId, lotId)}/entries`, input);
}

export function useAddLotEntry(kitchenId: string, lotId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateLotEntryInput) => addLotEntry(kitchenId, lotId, input),
    onSuccess: async (answer) => {
      queryClient.setQueryData(pantryKeys.detail(kitchenId, lotId), answer.lot);
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: pantryKeys.lists(kitchenId) }),
        queryClient.invalidateQueries({ queryKey: pantryKeys.summary(kitchenId) }),
      ]);
    },
  });
}
