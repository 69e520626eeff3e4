import { rulesOf, type KitchenView, type PlanAnswer, type RecipeView } from '@jarday/contracts';
import { CAUTIONS, planProcess } from '@jarday/rules';
import { screen, waitFor, within } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import { stubFetch } from '../../testing/fetch-stub';
import { orchardKitchen } from '../../testing/fixtures';
import { renderWithProviders } from '../../testing/render';
import { bath, tomatoesInWater, weightedCanner } from '../../features/recipes/testing/recipe-fixtures';
import RecipeRoute from './recipe';

const kitchenPath = `/api/kitchens/${orchardKitchen.id}`;

/** The plan the server answers with: the rules' own plan for the recipe at the kitchen in the bath canner. */
function serverPlan(
  recipe: RecipeView,
  kitchen: KitchenView,
  jarSize: 'pint' | 'quart',
  pack: 'hot' | 'raw',
): PlanAnswer {
  const result = planProcess({ recipe: rulesOf(recipe), jarSize, pack, altitude: kitchen.altitude, canner: bath });
  if (!result.ok) throw new Error(result.reason.message);
  return { ok: true, plan: result.plan, cautions: result.plan.cautionIds.map((id) => CAUTIONS[id]) };
}

function renderRecipePage(opts: {
  recipe?: RecipeView;
  kitchen?: KitchenView;
  plan?: (url: URL) => PlanAnswer;
  routes?: Parameters<typeof stubFetch>[0];
}) {
  const recipe = opts.recipe ?? tomatoesInWater();
  const kitchen = opts.kitchen ?? orchardKitchen;
  const plan =
    opts.plan ??
    ((url: URL) =>
      serverPlan(recipe, kitchen, url.searchParams.get('jarSize') as 'pint', url.searchParams.get('pack') as 'hot'));
  const stub = stubFetch({
    [`GET ${kitchenPath}`]: { status: 200, body: kitchen },
    [`GET ${kitchenPath}/recipes/${recipe.id}`]: { status: 200, body: recipe },
    [`GET ${kitchenPath}/canners`]: { status: 200, body: [bath, weightedCanner] },
    ...opts.routes,
  });
  // The plan's query string decides its answer, and the table stub keys on paths only: read the URL here.
  const planPath = `${kitchenPath}/recipes/${recipe.id}/plan`;
  const planUrls: URL[] = [];
  const stubbed = stub.fetchMock.getMockImplementation()!;
  stub.fetchMock.mockImplementation(async (input, init) => {
    // The app's client always passes the address as a string.
    const url = new URL(input as string, 'http://jarday.test');
    if (url.pathname === planPath) {
      planUrls.push(url);
      return new Response(JSON.stringify(plan(url)), { status: 200, headers: { 'Content-Type': 'application/json' } });
    }
    return stubbed(input, init);
  });
  const r = renderWithProviders(
    <Routes>
      <Route path="/kitchens/:kitchenId/recipes/:recipeId" element={<RecipeRoute />} />
      <Route path="/kitchens/:kitchenId/recipes" element={<h1>The recipe box</h1>} />
    </Routes>,
    { route: `/kitchens/${kitchen.id}/recipes/${recipe.id}` },
  );
  return { ...r, stub, planUrls };
}

describe('the recipe page', () => {
  it("highlights the kitchen's own band in the process table", async () => {
    renderRecipePage({});
    // 1,250 ft falls in the 1,001-3,000 ft band of the USDA Guide 3 table.
    const mine = await screen.findByRole('columnheader', { name: /1,001–3,000 ft/ });
    expect(mine.getAttribute('aria-current')).toBe('true');
    expect(within(mine).getByText('Your kitchen')).toBeTruthy();
    for (const other of ['0–1,000 ft', '3,001–6,000 ft', 'Above 6,000 ft']) {
      expect(screen.getByRole('columnheader', { name: other }).getAttribute('aria-current')).toBeNull();
    }
    const pintHot = screen.getByRole('row', { name: /^Pint jars, hot pack/ });
    const current = within(pintHot)
      .getAllByRole('cell')
      .filter((c) => c.getAttribute('aria-current') === 'true');
    expect(current.map((c) => c.textContent)).toEqual(['45 min']);
  });

  it('moves the highlight with the altitude: 2,000 m is above 6,000 ft', async () => {
    renderRecipePage({ kitchen: { ...orchardKitchen, altitude: { value: 2000, unit: 'm' } } });
    const top = await screen.findByRole('columnheader', { name: /Above 6,000 ft/ });
    expect(top.getAttribute('aria-current')).toBe('true');
    expect(screen.getByRole('columnheader', { name: '1,001–3,000 ft' }).getAttribute('aria-current')).toBeNull();
  });

  it("shows the server's plan for the chosen jar and asks again when the choice changes", async () => {
    const { user, planUrls } = renderRecipePage({});
    await waitFor(() => expect(screen.getByLabelText('Process time').textContent).toBe('45 minutes'));
    expect(planUrls[0]?.searchParams.get('cannerId')).toBe(bath.id);
    expect(planUrls[0]?.searchParams.get('pack')).toBe('hot');

    await user.selectOptions(screen.getByLabelText('Jar size and pack'), 'quart/hot');
    // USDA Guide 3: quarts, 50 min at 1,001-3,000 ft.
    await waitFor(() => expect(screen.getByLabelText('Process time').textContent).toBe('50 minutes'));
    expect(planUrls.at(-1)?.searchParams.get('jarSize')).toBe('quart');
  });

  it('shows a refusal from the server as its message, not as a failure', async () => {
    const message =
      'Whole or halved tomatoes in water has a tested boiling-water process only; choose a boiling-water canner.';
    const { user, planUrls } = renderRecipePage({
      plan: (url) =>
        url.searchParams.get('cannerId') === weightedCanner.id
          ? { ok: false, reason: { code: 'method-mismatch', message } }
          : serverPlan(tomatoesInWater(), orchardKitchen, 'pint', 'hot'),
    });
    await screen.findByLabelText('Process time');

    await user.selectOptions(screen.getByLabelText('Canner'), weightedCanner.id);
    expect(await screen.findByText(message)).toBeTruthy();
    expect(screen.getByText('No plan for this choice')).toBeTruthy();
    expect(screen.queryByLabelText('Process time')).toBeNull();
    expect(planUrls.at(-1)?.searchParams.get('cannerId')).toBe(weightedCanner.id);
  });

  it('carries the untested badge for a recipe that is not tested, and not for a tested one', async () => {
    const first = renderRecipePage({ recipe: tomatoesInWater({ tested: false }) });
    expect(await screen.findByRole('heading', { level: 1, name: 'Whole or halved tomatoes in water' })).toBeTruthy();
    // On the page and again on the plan itself.
    await waitFor(() => expect(screen.getAllByText('Not a tested recipe')).toHaveLength(2));
    first.unmount();

    renderRecipePage({});
    await screen.findByLabelText('Process time');
    expect(screen.queryByText('Not a tested recipe')).toBeNull();
  });

  it('offers Edit and Delete to a lead only', async () => {
    const lead = renderRecipePage({});
    expect(await screen.findByRole('link', { name: 'Edit' })).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Delete' })).toBeTruthy();
    lead.unmount();

    renderRecipePage({ kitchen: { ...orchardKitchen, role: 'helper' } });
    await screen.findByRole('heading', { level: 1, name: 'Whole or halved tomatoes in water' });
    expect(screen.queryByRole('link', { name: 'Edit' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Delete' })).toBeNull();
  });

  it('deletes the recipe after asking, then goes back to the recipe box', async () => {
    const recipe = tomatoesInWater();
    const deleteKey = `DELETE ${kitchenPath}/recipes/${recipe.id}`;
    const { user, stub } = renderRecipePage({ recipe, routes: { [deleteKey]: { status: 204 } } });

    await user.click(await screen.findByRole('button', { name: 'Delete' }));
    expect(stub.to(deleteKey)).toHaveLength(0);
    const dialog = screen.getByRole('dialog', { name: `Delete ${recipe.name}?` });
    await user.click(within(dialog).getByRole('button', { name: 'Delete recipe' }));

    expect(await screen.findByRole('heading', { name: 'The recipe box' })).toBeTruthy();
    expect(stub.to(deleteKey)).toHaveLength(1);
  });
});
