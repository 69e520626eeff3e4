/** Query keys of the canners feature. */
export const cannerKeys = {
  all: ['canners'] as const,
  list: (kitchenId: string) => [...cannerKeys.all, 'list', kitchenId] as const,
};
