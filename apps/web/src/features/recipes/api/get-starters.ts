import type { RecipeView } from '@jarday/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { recipeKeys } from './recipe-keys';

/** GET /api/recipes/starters: the built-in starter set every kitchen can read and copy. */
export function getStarters(): Promise<RecipeView[]> {
  return api.get<RecipeView[]>('/recipes/starters');
}

// The starter set ships with the server and changes only with a release.
export const startersQueryOptions = () =>
  queryOptions({ queryKey: recipeKeys.starters(), queryFn: getStarters, staleTime: 60 * 60_000 });

export const useStarters = () => useQuery(startersQueryOptions());
