/** Query keys of the pantry, broad to narrow (TanStack Query's hierarchical keys). */
export const pantryKeys = {
  all: ['pantry'] as const,
  kitchen: (kitchenId: string) => [...pantryKeys.all, kitchenId] as const,
  summary: (kitchenId: string) => [...pantryKeys.kitchen(kitchenId), 'summary'] as const,
  lists: (kitchenId: string) => [...pantryKeys.kitchen(kitchenId), 'lots'] as const,
  list: (kitchenId: string, dayId?: string) => [...pantryKeys.lists(kitchenId), dayId ?? 'all'] as const,
  detail: (kitchenId: string, lotId: string) => [...pantryKeys.kitchen(kitchenId), 'lot', lotId] as const,
};

export const lotsPath = (kitchenId: string) => `/kitchens/${encodeURIComponent(kitchenId)}/lots`;
export const lotPath = (kitchenId: string, lotId: string) => `${lotsPath(kitchenId)}/${encodeURIComponent(lotId)}`;
