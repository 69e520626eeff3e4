import type { CreateDayInput, DayView } from '@jarday/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { dayKeys, daysPath } from './day-keys';

/** POST /api/kitchens/:kitchenId/days (lead). */
export function createDay(kitchenId: string, input: CreateDayInput): Promise<DayView> {
  return api.post<DayView>(daysPath(kitchenId), input);
}

export function useCreateDay(kitchenId: string, options: { onSuccess?: (day: DayView) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateDayInput) => createDay(kitchenId, input),
    onSuccess: async (day) => {
      queryClient.setQueryData(dayKeys.detail(day.id), day);
      options.onSuccess?.(day);
      await queryClient.invalidateQueries({ queryKey: dayKeys.list(kitchenId) });
    },
  });
}
