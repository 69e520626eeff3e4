import type { PantrySummaryView } from '@jarday/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { pantryKeys } from './pantry-keys';

/** GET /api/kitchens/:kitchenId/pantry (any member): jars on the shelf by size, across every lot. */
export function getPantrySummary(kitchenId: string): Promise<PantrySummaryView> {
  return api.get<PantrySummaryView>(`/kitchens/${encodeURIComponent(kitchenId)}/pantry`);
}

export const pantrySummaryQueryOptions = (kitchenId: string) =>
  queryOptions({ queryKey: pantryKeys.summary(kitchenId), queryFn: () => getPantrySummary(kitchenId) });

export const usePantrySummary = (kitchenId: string) => useQuery(pantrySummaryQueryOptions(kitchenId));
