import type { DaySummaryView } from '@jarday/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { dayKeys, daysPath } from './day-keys';

/** GET /api/kitchens/:kitchenId/days (any member): the kitchen's days, newest first. */
export function getDays(kitchenId: string): Promise<DaySummaryView[]> {
  return api.get<DaySummaryView[]>(daysPath(kitchenId));
}

export const daysQueryOptions = (kitchenId: string) =>
  queryOptions({ queryKey: dayKeys.list(kitchenId), queryFn: () => getDays(kitchenId) });

export const useDays = (kitchenId: string) => useQuery(daysQueryOptions(kitchenId));
