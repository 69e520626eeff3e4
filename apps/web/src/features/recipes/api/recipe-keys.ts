import type { PlanQuery } from '@jarday/contracts';

/**
 * Query keys of the recipes feature, broad to narrow: invalidating a kitchen's branch refreshes its list, every
 * recipe and every plan preview, and a recipe's detail key covers its plans.
 */
export const recipeKeys = {
  all: ['recipes'] as const,
  starters: () => [...recipeKeys.all, 'starters'] as const,
  starter: (starterId: string) => [...recipeKeys.starters(), starterId] as const,
  kitchen: (kitchenId: string) => [...recipeKeys.all, 'kitchen', kitchenId] as const,
  list: (kitchenId: string) => [...recipeKeys.kitchen(kitchenId), 'list'] as const,
  detail: (kitchenId: string, recipeId: string) => [...recipeKeys.kitchen(kitchenId), 'detail', recipeId] as const,
  plans: (kitchenId: string, recipeId: string) => [...recipeKeys.detail(kitchenId, recipeId), 'plan'] as const,
  plan: (kitchenId: string, recipeId: string, query: PlanQuery) =>
    [...recipeKeys.plans(kitchenId, recipeId), query.jarSize, query.pack, query.cannerId] as const,
};

export const kitchenRecipesPath = (kitchenId: string) => `/kitchens/${encodeURIComponent(kitchenId)}/recipes`;
export const recipePath = (kitchenId: string, recipeId: string) =>
  `${kitchenRecipesPath(kitchenId)}/${encodeURIComponent(recipeId)}`;
