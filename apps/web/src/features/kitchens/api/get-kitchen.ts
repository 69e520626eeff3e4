import type { KitchenView } from '@jarday/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { kitchenKeys } from './kitchen-keys';

/** GET /api/kitchens/:kitchenId; 404 when I am not a member. */
export function getKitchen(kitchenId: string): Promise<KitchenView> {
  return api.get<KitchenView>(`/kitchens/${encodeURIComponent(kitchenId)}`);
}

export const kitchenQueryOptions = (kitchenId: string) =>
  queryOptions({ queryKey: kitchenKeys.detail(kitchenId), queryFn: () => getKitchen(kitchenId) });

export const useKitchen = (kitchenId: string | undefined) =>
  useQuery({ ...kitchenQueryOptions(kitchenId ?? ''), enabled: Boolean(kitchenId) });
