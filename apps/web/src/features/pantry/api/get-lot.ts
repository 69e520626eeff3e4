import type { LotView } from '@jarday/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { lotPath, pantryKeys } from './pantry-keys';

/** GET /api/kitchens/:kitchenId/lots/:lotId (any member): the lot with its entries. */
export function getLot(kitchenId: string, lotId: string): Promise<LotView> {
  return api.get<LotView>(lotPath(kitchenId, lotId));
}

export const lotQueryOptions = (kitchenId: string, lotId: string) =>
  queryOptions({ queryKey: pantryKeys.detail(kitchenId, lotId), queryFn: () => getLot(kitchenId, lotId) });

export const useLot = (kitchenId: string, lotId: string) => useQuery(lotQueryOptions(kitchenId, lotId));
