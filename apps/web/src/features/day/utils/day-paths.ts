/** The pages of a canning day. */
export const dayPaths = {
  list: (kitchenId: string) => `/kitchens/${kitchenId}/days`,
  start: (kitchenId: string) => `/kitchens/${kitchenId}/days/new`,
  plan: (kitchenId: string, dayId: string) => `/kitchens/${kitchenId}/days/${dayId}`,
  board: (kitchenId: string, dayId: string) => `/kitchens/${kitchenId}/days/${dayId}/board`,
  pocket: (kitchenId: string, dayId: string) => `/kitchens/${kitchenId}/days/${dayId}/pocket`,
};
