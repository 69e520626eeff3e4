import type { CannerView } from '@jarday/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { cannerKeys } from './canner-keys';

/** GET /api/kitchens/:kitchenId/canners */
export function getCanners(kitchenId: string): Promise<CannerView[]> {
  return api.get<CannerView[]>(`/kitchens/${encodeURIComponent(kitchenId)}/canners`);
}

export const cannersQueryOptions = (kitchenId: string) =>
  queryOptions({ queryKey: cannerKeys.list(kitchenId), queryFn: () => getCanners(kitchenId) });

export const useCanners = (kitchenId: string) => useQuery(cannersQueryOptions(kitchenId));
