import type { KitchenView } from '@jarday/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { kitchenKeys } from './kitchen-keys';

/** GET /api/kitchens: the kitchens I belong to, each with my role. */
export function getKitchens(): Promise<KitchenView[]> {
  return api.get<KitchenView[]>('/kitchens');
}

export const kitchensQueryOptions = () => queryOptions({ queryKey: kitchenKeys.list(), queryFn: getKitchens });

export const useKitchens = () => useQuery(kitchensQueryOptions());
