import { rulesOf, type PlanAnswer, type RecipeData, type RecipeView } from '@jarday/contracts';
import { CAUTIONS, planProcess } from '@jarday/rules';
import { ThemeProvider } from '@mui/material/styles';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { useSessionStore } from '../../features/auth/stores/session-store';
import { bindSessionToApiClient } from '../../features/auth/utils/session';
import { bath, tomatoesInWater } from '../../features/recipes/testing/recipe-fixtures';
import { stubFetch, type RecordedRequest } from '../../testing/fetch-stub';
import { ada, orchardKitchen, sessionFor } from '../../testing/fixtures';
import { createRoutes } from '../router';
import { theme } from '../theme';

const kitchenPath = `/api/kitchens/${orchardKitchen.id}`;
// The first visit loads the editor's lazy chunk, which a cold test transform takes a while to build.
const LAZY = { timeout: 15_000 };
const UNTESTED = 'The process times were changed, so this is no longer the tested recipe. It is marked untested.';

/** A small stand-in for the server's recipe store: PUT replaces the recipe and, when times changed, untests it. */
function recipeServer(initial: RecipeView) {
  let stored = initial;
  return {
    get: () => ({ status: 200, body: stored }),
    put: (request: RecordedRequest) => {
      const data = request.body as RecipeData;
      const retimed = JSON.stringify(data.processing) !== JSON.stringify(stored.processing);
      const untested = stored.tested && retimed;
      stored = { ...stored, ...data, tested: untested ? false : data.tested };
      return { status: 200, body: { recipe: stored, notice: { untestedBecause: untested ? UNTESTED : null } } };
    },
    plan: (): { status: number; body: PlanAnswer } => {
      const result = planProcess({
        recipe: rulesOf(stored),
        jarSize: 'pint',
        pack: 'hot',
        altitude: orchardKitchen.altitude,
        canner: bath,
      });
      if (!result.ok) return { status: 200, body: result };
      return {
        status: 200,
        body: { ok: true, plan: result.plan, cautions: result.plan.cautionIds.map((id) => CAUTIONS[id]) },
      };
    },
  };
}

function renderApp(path: string) {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  const router = createMemoryRouter(createRoutes(queryClient), { initialEntries: [path] });
  render(
    <ThemeProvider theme={theme}>
      <QueryClientProvider client={queryClient}>
        <RouterProvider router={router} />
      </QueryClientProvider>
    </ThemeProvider>,
  );
  return { router, user: userEvent.setup() };
}

describe('saving an edited recipe', () => {
  let unbind: () => void;
  beforeEach(() => {
    unbind = bindSessionToApiClient();
    useSessionStore.getState().setSession(sessionFor(ada));
  });
  afterEach(() => unbind());

  const setup = () => {
    const recipe = tomatoesInWater();
    const server = recipeServer(recipe);
    const stub = stubFetch({
      [`GET ${kitchenPath}`]: { status: 200, body: orchardKitchen },
      [`GET ${kitchenPath}/canners`]: { status: 200, body: [bath] },
      [`GET ${kitchenPath}/recipes/${recipe.id}`]: server.get,
      [`PUT ${kitchenPath}/recipes/${recipe.id}`]: server.put,
      [`GET ${kitchenPath}/recipes/${recipe.id}/plan`]: server.plan,
    });
    return { recipe, stub, ...renderApp(`/kitchens/${orchardKitchen.id}/recipes/${recipe.id}/edit`) };
  };

  it("shows the server's untested notice after the times of a tested recipe change", { timeout: 30_000 }, async () => {
    const { recipe, stub, router, user } = setup();
    const cell = await screen.findByLabelText('Minutes for pint jars, hot pack at 1,001–3,000 ft', {}, LAZY);
    await user.clear(cell);
    await user.type(cell, '47');
    await user.click(screen.getByRole('button', { name: 'Save recipe' }));

    const title = await screen.findByText('Saved, and now marked untested', {}, LAZY);
    expect(title.closest('[role="alert"]')?.textContent).toContain(UNTESTED);
    expect(router.state.location.pathname).toBe(`/kitchens/${orchardKitchen.id}/recipes/${recipe.id}`);
    const sent = stub.to(`PUT ${kitchenPath}/recipes/${recipe.id}`)[0]?.body as RecipeData;
    expect(sent.processing.boilingWater?.rows[0]?.minutes).toEqual([40, 47, 50, 55]);
    // The page now reads the untested recipe, badge and all, and its plan uses the new time.
    await waitFor(() => expect(screen.getByLabelText('Process time').textContent).toBe('47 minutes'));
    expect(screen.getAllByText('Not a tested recipe').length).toBeGreaterThan(0);
  });

  it('says only "saved" when the times did not change', { timeout: 30_000 }, async () => {
    const { recipe, stub, user } = setup();
    const name = await screen.findByLabelText('Recipe name', {}, LAZY);
    await user.clear(name);
    await user.click(name);
    await user.paste('Tomatoes for the winter shelf');
    await user.click(screen.getByRole('button', { name: 'Save recipe' }));

    expect(await screen.findByText('Recipe saved.', {}, LAZY)).toBeTruthy();
    expect(screen.queryByText('Saved, and now marked untested')).toBeNull();
    expect(screen.queryByText('Not a tested recipe')).toBeNull();
    expect((stub.to(`PUT ${kitchenPath}/recipes/${recipe.id}`)[0]?.body as RecipeData).name).toBe(
      'Tomatoes for the winter shelf',
    );
  });
});
