import type { PlanAnswer, PlanQuery } from '@jarday/contracts';
import { queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { recipeKeys, recipePath } from './recipe-keys';

/**
 * GET /api/kitchens/:kitchenId/recipes/:recipeId/plan (any member): the plan for one load at the kitchen's
 * altitude. A refusal (`ok: false`) is a normal answer with a message for the cook, not an error.
 */
export function getRecipePlan(kitchenId: string, recipeId: string, query: PlanQuery): Promise<PlanAnswer> {
  const search = new URLSearchParams({ jarSize: query.jarSize, pack: query.pack, cannerId: query.cannerId });
  return api.get<PlanAnswer>(`${recipePath(kitchenId, recipeId)}/plan?${search.toString()}`);
}

export const recipePlanQueryOptions = (kitchenId: string, recipeId: string, query: PlanQuery) =>
  queryOptions({
    queryKey: recipeKeys.plan(kitchenId, recipeId, query),
    queryFn: () => getRecipePlan(kitchenId, recipeId, query),
  });

/** The plan for the chosen jar, pack and canner; idle until all three are chosen. */
export function useRecipePlan(kitchenId: string, recipeId: string, query: PlanQuery | null) {
  return useQuery({
    queryKey: query ? recipeKeys.plan(kitchenId, recipeId, query) : recipeKeys.plans(kitchenId, recipeId),
    queryFn: query ? () => getRecipePlan(kitchenId, recipeId, query) : skipToken,
  });
}
