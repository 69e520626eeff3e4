import type { QueryClient } from '@tanstack/react-query';
import { useMemo, type ComponentType } from 'react';
import {
  createBrowserRouter,
  redirect,
  RouterProvider,
  type LoaderFunction,
  type LoaderFunctionArgs,
  type RouteObject,
} from 'react-router-dom';
import { Loading } from '../components/ui/query-state';
import { paths } from '../config/paths';
import { useSessionStore } from '../features/auth/stores/session-store';
import { PublicOnly, RequireAuth } from './routes/guards';
import { RootLayout } from './routes/root';
import { RouteError } from './routes/route-error';

/** What a lazily loaded route module offers: its page and, optionally, a loader that warms the cache. */
export interface RouteModule {
  default: ComponentType;
  clientLoader?: (queryClient: QueryClient) => LoaderFunction;
}

/**
 * Loaders run before the guards render, so protected ones check the session themselves and send a
 * signed-out person to sign-in with the path they asked for.
 */
function signedInOnly(loader: LoaderFunction | undefined): LoaderFunction {
  return (args: LoaderFunctionArgs) => {
    if (useSessionStore.getState().status !== 'signed-in') {
      const url = new URL(args.request.url);
      return redirect(paths.signIn(url.pathname + url.search));
    }
    return loader ? loader(args) : null;
  };
}

/** Builds the route table; pages are split into their own chunks and loaded on first visit. */
export function createRoutes(queryClient: QueryClient): RouteObject[] {
  const page =
    (load: () => Promise<RouteModule>, guarded = false): RouteObject['lazy'] =>
    async () => {
      const module = await load();
      const loader = module.clientLoader?.(queryClient);
      return { Component: module.default, loader: guarded ? signedInOnly(loader) : loader };
    };

  return [
    {
      path: '/',
      element: <RootLayout />,
      errorElement: <RouteError />,
      hydrateFallbackElement: <Loading label="Loading Jarday" />,
      children: [
        {
          element: <PublicOnly />,
          children: [
            { path: 'sign-in', lazy: page(() => import('./routes/sign-in')) },
            { path: 'register', lazy: page(() => import('./routes/register')) },
          ],
        },
        { path: 'join/:code', lazy: page(() => import('./routes/join')) },
        // What a jar label's QR code opens: public, a member sees more.
        { path: 'r/:ref', lazy: page(() => import('./routes/jar-record')) },
        { path: 'dev/mail', lazy: page(() => import('./routes/dev-mail')) },
        {
          element: <RequireAuth />,
          children: [
            { index: true, loader: signedInOnly(() => redirect(paths.kitchens())) },
            { path: 'kitchens', lazy: page(() => import('./routes/kitchens'), true) },
            { path: 'kitchens/:kitchenId', lazy: page(() => import('./routes/kitchen'), true) },
            { path: 'kitchens/:kitchenId/members', lazy: page(() => import('./routes/members'), true) },
            { path: 'kitchens/:kitchenId/settings', lazy: page(() => import('./routes/settings'), true) },
            { path: 'kitchens/:kitchenId/recipes', lazy: page(() => import('./routes/recipes'), true) },
            // The editor routes are their own chunks, so reading a recipe never loads the editor.
            { path: 'kitchens/:kitchenId/recipes/new', lazy: page(() => import('./routes/recipe-new'), true) },
            {
              path: 'kitchens/:kitchenId/recipes/starters/:starterId',
              lazy: page(() => import('./routes/recipe-starter'), true),
            },
            { path: 'kitchens/:kitchenId/recipes/:recipeId', lazy: page(() => import('./routes/recipe'), true) },
            {
              path: 'kitchens/:kitchenId/recipes/:recipeId/edit',
              lazy: page(() => import('./routes/recipe-edit'), true),
            },
            // Canning days: the plan, and the live board and pocket view, each its own small chunk.
            { path: 'kitchens/:kitchenId/days', lazy: page(() => import('./routes/days'), true) },
            { path: 'kitchens/:kitchenId/plan', lazy: page(() => import('./routes/planner'), true) },
            { path: 'kitchens/:kitchenId/days/new', lazy: page(() => import('./routes/day-new'), true) },
            { path: 'kitchens/:kitchenId/days/:dayId', lazy: page(() => import('./routes/day'), true) },
            { path: 'kitchens/:kitchenId/days/:dayId/board', lazy: page(() => import('./routes/board'), true) },
            { path: 'kitchens/:kitchenId/days/:dayId/pocket', lazy: page(() => import('./routes/pocket'), true) },
            { path: 'kitchens/:kitchenId/days/:dayId/journal', lazy: page(() => import('./routes/journal'), true) },
            // After the canner: the cooling shelf, the pantry and a lot's page.
            { path: 'kitchens/:kitchenId/cooling', lazy: page(() => import('./routes/cooling'), true) },
            { path: 'kitchens/:kitchenId/pantry', lazy: page(() => import('./routes/pantry'), true) },
            { path: 'kitchens/:kitchenId/pantry/:lotId', lazy: page(() => import('./routes/lot'), true) },
          ],
        },
        { path: '*', lazy: page(() => import('./routes/not-found')) },
      ],
    },
  ];
}

export function AppRouter({ queryClient }: { queryClient: QueryClient }) {
  const router = useMemo(() => createBrowserRouter(createRoutes(queryClient)), [queryClient]);
  return <RouterProvider router={router} />;
}
