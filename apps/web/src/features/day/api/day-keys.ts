/** Query keys of the day feature, broad to narrow (TanStack Query's hierarchical keys). */
export const dayKeys = {
  all: ['days'] as const,
  lists: () => [...dayKeys.all, 'list'] as const,
  list: (kitchenId: string) => [...dayKeys.lists(), kitchenId] as const,
  details: () => [...dayKeys.all, 'detail'] as const,
  detail: (dayId: string) => [...dayKeys.details(), dayId] as const,
};

export const daysPath = (kitchenId: string) => `/kitchens/${encodeURIComponent(kitchenId)}/days`;
export const dayPath = (kitchenId: string, dayId: string) => `${daysPath(kitchenId)}/${encodeURIComponent(dayId)}`;
