import type { CoolingLoadView, SealCheckInput } from '@jarday/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { coolingKeys, loadPath } from './cooling-keys';

/** PUT /api/kitchens/:kitchenId/loads/:loadId/seal-checks (lead, helper): the result and outcome of each jar. */
export function saveSealChecks(kitchenId: string, loadId: string, input: SealCheckInput): Promise<CoolingLoadView> {
  return api.put<CoolingLoadView>(`${loadPath(kitchenId, loadId)}/seal-checks`, input);
}

export function useSaveSealChecks(kitchenId: string, loadId: string, options: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SealCheckInput) => saveSealChecks(kitchenId, loadId, input),
    onSuccess: async () => {
      options.onSuccess?.();
      await queryClient.invalidateQueries({ queryKey: coolingKeys.kitchen(kitchenId) });
    },
  });
}
