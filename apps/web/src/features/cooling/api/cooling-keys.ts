/** Query keys of the cooling shelf, broad to narrow (TanStack Query's hierarchical keys). */
export const coolingKeys = {
  all: ['cooling'] as const,
  kitchen: (kitchenId: string) => [...coolingKeys.all, kitchenId] as const,
  /** One shelf: every load still cooling in the kitchen, or one day's loads. */
  shelf: (kitchenId: string, dayId?: string) => [...coolingKeys.kitchen(kitchenId), dayId ?? 'current'] as const,
};

export const kitchenPath = (kitchenId: string) => `/kitchens/${encodeURIComponent(kitchenId)}`;
export const loadPath = (kitchenId: string, loadId: string) =>
  `${kitchenPath(kitchenId)}/loads/${encodeURIComponent(loadId)}`;
