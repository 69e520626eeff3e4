import type { CreateLoadInput, LoadView } from '@jarday/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { dayKeys, dayPath } from './day-keys';

/**
 * POST /api/kitchens/:kitchenId/days/:dayId/loads (lead, helper). The server plans the load and makes its process
 * timer with the tested minutes, or refuses with the rules' reason (`plan_refused`, `load_too_big`).
 */
export function addLoad(kitchenId: string, dayId: string, input: CreateLoadInput): Promise<LoadView> {
  return api.post<LoadView>(`${dayPath(kitchenId, dayId)}/loads`, input);
}

export function useAddLoad(kitchenId: string, dayId: string, options: { onSuccess?: (load: LoadView) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateLoadInput) => addLoad(kitchenId, dayId, input),
    onSuccess: async (load) => {
      options.onSuccess?.(load);
      await queryClient.invalidateQueries({ queryKey: dayKeys.detail(dayId) });
    },
  });
}
