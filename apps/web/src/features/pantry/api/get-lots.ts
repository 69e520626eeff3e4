import type { LotView } from '@jarday/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { lotsPath, pantryKeys } from './pantry-keys';

/** GET /api/kitchens/:kitchenId/lots[?dayId=] (any member): every lot of the kitchen, or one day's. */
export function getLots(kitchenId: string, dayId?: string): Promise<LotView[]> {
  const query = dayId ? `?dayId=${encodeURIComponent(dayId)}` : '';
  return api.get<LotView[]>(`${lotsPath(kitchenId)}${query}`);
}

export const lotsQueryOptions = (kitchenId: string, dayId?: string) =>
  queryOptions({ queryKey: pantryKeys.list(kitchenId, dayId), queryFn: () => getLots(kitchenId, dayId) });

export const useLots = (kitchenId: string, dayId?: string) => useQuery(lotsQueryOptions(kitchenId, dayId));
