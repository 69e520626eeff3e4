import type { ReprocessAnswer, ReprocessInput } from '@jarday/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { coolingKeys, loadPath } from './cooling-keys';

/**
 * POST /api/kitchens/:kitchenId/loads/:loadId/reprocess (lead, helper): the jars marked "reprocess" go into a new
 * load of the same day (reopened if it was closed), with new lids and the full process time; that day's Counter board
 * runs it. Refused after the 24-hour window, with the reason.
 */
export function reprocessLoad(kitchenId: string, loadId: string, input: ReprocessInput): Promise<ReprocessAnswer> {
  return api.post<ReprocessAnswer>(`${loadPath(kitchenId, loadId)}/reprocess`, input);
}

export function useReprocessLoad(kitchenId: string, loadId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: ReprocessInput) => reprocessLoad(kitchenId, loadId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: coolingKeys.kitchen(kitchenId) }),
  });
}
