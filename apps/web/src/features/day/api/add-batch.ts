import type { BatchView, CreateBatchInput } from '@jarday/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { dayKeys, dayPath } from './day-keys';

/** POST /api/kitchens/:kitchenId/days/:dayId/batches (lead): a recipe at a scale. */
export function addBatch(kitchenId: string, dayId: string, input: CreateBatchInput): Promise<BatchView> {
  return api.post<BatchView>(`${dayPath(kitchenId, dayId)}/batches`, input);
}

export function useAddBatch(
  kitchenId: string,
  dayId: string,
  options: { onSuccess?: (batch: BatchView) => void } = {},
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateBatchInput) => addBatch(kitchenId, dayId, input),
    onSuccess: async (batch) => {
      options.onSuccess?.(batch);
      await queryClient.invalidateQueries({ queryKey: dayKeys.detail(dayId) });
    },
  });
}
