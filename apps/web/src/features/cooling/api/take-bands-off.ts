import type { BandsOffInput, CoolingLoadView } from '@jarday/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { coolingKeys, loadPath } from './cooling-keys';

/**
 * POST /api/kitchens/:kitchenId/loads/:loadId/bands-off (lead, helper). Before 12 hours the server refuses with the
 * time still to wait as its message; a lead may send `override.reason` to take them off anyway.
 */
export function takeBandsOff(kitchenId: string, loadId: string, input: BandsOffInput): Promise<CoolingLoadView> {
  return api.post<CoolingLoadView>(`${loadPath(kitchenId, loadId)}/bands-off`, input);
}

export function useTakeBandsOff(kitchenId: string, loadId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: BandsOffInput) => takeBandsOff(kitchenId, loadId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: coolingKeys.kitchen(kitchenId) }),
  });
}
