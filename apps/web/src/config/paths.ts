/** Paths of every page, in one place so links and redirects agree. */
export const paths = {
  home: () => '/',
  signIn: (next?: string) => withNext('/sign-in', next),
  register: (next?: string) => withNext('/register', next),
  kitchens: () => '/kitchens',
  kitchen: (kitchenId: string) => `/kitchens/${kitchenId}`,
  members: (kitchenId: string) => `/kitchens/${kitchenId}/members`,
  settings: (kitchenId: string) => `/kitchens/${kitchenId}/settings`,
  recipes: (kitchenId: string) => `/kitchens/${kitchenId}/recipes`,
  recipe: (kitchenId: string, recipeId: string) => `/kitchens/${kitchenId}/recipes/${recipeId}`,
  newRecipe: (kitchenId: string) => `/kitchens/${kitchenId}/recipes/new`,
  editRecipe: (kitchenId: string, recipeId: string) => `/kitchens/${kitchenId}/recipes/${recipeId}/edit`,
  starter: (kitchenId: string, starterId: string) => `/kitchens/${kitchenId}/recipes/starters/${starterId}`,
  planner: (kitchenId: string) => `/kitchens/${kitchenId}/plan`,
  join: (code: string) => `/join/${code.replace(/-/g, '')}`,
  jarRecord: (ref: string) => `/r/${ref}`,
  devMail: () => '/dev/mail',
  cooling: (kitchenId: string, dayId?: string) => `/kitchens/${kitchenId}/cooling${dayId ? `?day=${dayId}` : ''}`,
  pantry: (kitchenId: string) => `/kitchens/${kitchenId}/pantry`,
  lot: (kitchenId: string, lotId: string) => `/kitchens/${kitchenId}/pantry/${lotId}`,
  journal: (kitchenId: string, dayId: string) => `/kitchens/${kitchenId}/days/${dayId}/journal`,
};

function withNext(path: string, next?: string): string {
  return next && next !== '/' ? `${path}?next=${encodeURIComponent(next)}` : path;
}

/**
 * Accepts a return path only when it stays on this site: a path starting with one slash.
 * Anything else (absolute URLs, protocol-relative `//host`) falls back, so a crafted link cannot send
 * a person elsewhere after sign-in.
 */
export function safeReturnPath(next: string | null | undefined, fallback = '/kitchens'): string {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) return fallback;
  return next;
}
