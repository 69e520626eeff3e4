import type { RecipeView } from '@jarday/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { recipeKeys } from './recipe-keys';

/** GET /api/recipes/starters/:starterId */
export function getStarter(starterId: string): Promise<RecipeView> {
  return api.get<RecipeView>(`/recipes/starters/${encodeURIComponent(starterId)}`);
}

export const starterQueryOptions = (starterId: string) =>
  queryOptions({
    queryKey: recipeKeys.starter(starterId),
    queryFn: () => getStarter(starterId),
    staleTime: 60 * 60_000,
  });

export const useStarter = (starterId: string) => useQuery(starterQueryOptions(starterId));
