/** Query keys of the members feature. */
export const memberKeys = {
  all: ['members'] as const,
  list: (kitchenId: string) => [...memberKeys.all, 'list', kitchenId] as const,
  me: (kitchenId: string) => [...memberKeys.all, 'me', kitchenId] as const,
};
