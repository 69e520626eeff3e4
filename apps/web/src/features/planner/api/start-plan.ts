import type { DayView, StartPlanInput } from '@jarday/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { plansPath } from './planner-keys';

/** POST /api/kitchens/:kitchenId/plans/start (lead): opens the day with its batches and loads. */
export function startPlan(kitchenId: string, input: StartPlanInput): Promise<DayView> {
  return api.post<DayView>(`${plansPath(kitchenId)}/start`, input);
}

export function useStartPlan(kitchenId: string, options: { onSuccess?: (day: DayView) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: StartPlanInput) => startPlan(kitchenId, input),
    onSuccess: async (day) => {
      options.onSuccess?.(day);
      // The kitchen's days list now has one more (its keys belong to the day feature and start with 'days').
      await queryClient.invalidateQueries({ queryKey: ['days'] });
    },
  });
}
