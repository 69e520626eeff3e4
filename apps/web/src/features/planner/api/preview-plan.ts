import type { PlanPreviewAnswer, PlanRequest } from '@jarday/contracts';
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { plannerKeys, plansPath } from './planner-keys';

/** POST /api/kitchens/:kitchenId/plans/preview (any member): nothing is stored, so it is read like a query. */
export function previewPlan(kitchenId: string, request: PlanRequest): Promise<PlanPreviewAnswer> {
  return api.post<PlanPreviewAnswer>(`${plansPath(kitchenId)}/preview`, request);
}

/** The plan for the form's current request; the last plan stays on screen while the next one loads. */
export function usePlanPreview(kitchenId: string, request: PlanRequest | null) {
  return useQuery({
    queryKey: plannerKeys.preview(kitchenId, request),
    queryFn: () => previewPlan(kitchenId, request as PlanRequest),
    enabled: request !== null,
    placeholderData: keepPreviousData,
  });
}
