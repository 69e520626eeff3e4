import type { DayView } from '@jarday/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { dayKeys, dayPath } from './day-keys';

/** POST /api/kitchens/:kitchenId/days/:dayId/close (lead): the day becomes a read-only record. */
export function closeDay(kitchenId: string, dayId: string): Promise<DayView> {
  return api.post<DayView>(`${dayPath(kitchenId, dayId)}/close`);
}

export function useCloseDay(kitchenId: string, dayId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => closeDay(kitchenId, dayId),
    onSuccess: async (day) => {
      queryClient.setQueryData(dayKeys.detail(dayId), day);
      await queryClient.invalidateQueries({ queryKey: dayKeys.list(kitchenId) });
    },
  });
}
