/** Query keys of the kitchens feature, broad to narrow so one invalidation can cover a whole branch. */
export const kitchenKeys = {
  all: ['kitchens'] as const,
  list: () => [...kitchenKeys.all, 'list'] as const,
  detail: (kitchenId: string) => [...kitchenKeys.all, 'detail', kitchenId] as const,
};
