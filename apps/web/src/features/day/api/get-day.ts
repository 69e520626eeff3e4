import type { DayView } from '@jarday/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { dayKeys, dayPath } from './day-keys';

/** GET /api/kitchens/:kitchenId/days/:dayId (any member): the day with its batches and loads. */
export function getDay(kitchenId: string, dayId: string): Promise<DayView> {
  return api.get<DayView>(dayPath(kitchenId, dayId));
}

export const dayQueryOptions = (kitchenId: string, dayId: string) =>
  queryOptions({ queryKey: dayKeys.detail(dayId), queryFn: () => getDay(kitchenId, dayId) });

export const useDay = (kitchenId: string, dayId: string) => useQuery(dayQueryOptions(kitchenId, dayId));
