import type { RecipeData } from '@jarday/contracts';
import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { expectFieldError } from '../../../testing/assertions';
import { errorBody, stubFetch } from '../../../testing/fetch-stub';
import { orchardKitchen } from '../../../testing/fixtures';
import { renderWithProviders } from '../../../testing/render';
import { bath, tomatoSalsa } from '../testing/recipe-fixtures';
import { RecipeForm } from './recipe-form';

const recipesPath = `/api/kitchens/${orchardKitchen.id}/recipes`;

const setup = () => {
  const onSaved = vi.fn();
  const r = renderWithProviders(
    <RecipeForm kitchen={orchardKitchen} canners={[bath]} onSaved={onSaved} onCancel={vi.fn()} />,
  );
  return { ...r, onSaved };
};

/** Name, headspace and the USDA Guide 3 pint times (tomatoes in water: 40/45/50/55 min) in the default bands. */
async function fillValidRecipe(user: ReturnType<typeof setup>['user']) {
  await user.type(screen.getByLabelText('Recipe name'), 'Tomatoes in water');
  await user.selectOptions(screen.getByLabelText('Headspace'), '0.5');
  const times: [string, string][] = [
    ['0–1,000 ft', '40'],
    ['1,001–3,000 ft', '45'],
    ['3,001–6,000 ft', '50'],
    ['above 6,000 ft', '55'],
  ];
  for (const [band, minutes] of times) {
    await user.type(screen.getByLabelText(`Minutes for pint jars, hot pack at ${band}`), minutes);
  }
}

// The whole editor re-checks the draft on each keystroke; in happy-dom that is slow, so these get room to run.
describe('RecipeForm (new recipe)', { timeout: 20_000 }, () => {
  it('shows every message at its field on a refused save and sends nothing', async () => {
    const stub = stubFetch({});
    const { user } = setup();
    await user.click(screen.getByRole('button', { name: 'Add recipe' }));

    expectFieldError(screen.getByLabelText('Recipe name'), 'Name is required');
    expectFieldError(screen.getByLabelText('Headspace'), 'Headspace must be a number of inches');
    expectFieldError(
      screen.getByLabelText('Minutes for pint jars, hot pack at 0–1,000 ft'),
      'A process time must be a number of minutes',
    );
    expect(screen.getByText('The recipe was not saved')).toBeTruthy();
    // The cook is taken to the first field that needs attention.
    expect(document.activeElement).toBe(screen.getByLabelText('Recipe name'));
    expect(stub.requests).toHaveLength(0);
  });

  it('sends the recipe the schema accepts, with the times typed into the table', async () => {
    const saved = tomatoSalsa({ tested: false, source: null });
    const stub = stubFetch({ [`POST ${recipesPath}`]: { status: 201, body: saved } });
    const { user, onSaved } = setup();

    await user.type(screen.getByLabelText('Recipe name'), 'Garden salsa');
    await user.selectOptions(screen.getByLabelText('Category'), 'salsa');
    await user.click(screen.getByRole('radio', { name: /^Acidified food/ }));
    await user.selectOptions(screen.getByLabelText('Headspace'), '0.5');
    // A three-band layout like the NCHFP salsa table: remove the 3,001-6,000 ft band, then set the bounds.
    await user.click(screen.getByRole('button', { name: 'Remove band 3' }));
    await user.clear(screen.getByLabelText('Band 2 upper bound'));
    await user.type(screen.getByLabelText('Band 2 upper bound'), '6000');
    const times: [string, string][] = [
      ['0–1,000 ft', '15'],
      ['1,001–6,000 ft', '20'],
      ['above 6,000 ft', '25'],
    ];
    for (const [band, minutes] of times) {
      await user.type(screen.getByLabelText(`Minutes for pint jars, hot pack at ${band}`), minutes);
    }
    // The kitchen is at 1,250 ft: the preview reads the 1,001-6,000 ft cell.
    expect(screen.getByLabelText('Process time').textContent).toBe('20 minutes');
    expect(screen.getAllByText('Not a tested recipe')).toHaveLength(2);
    await user.click(screen.getByRole('button', { name: 'Add recipe' }));

    await waitFor(() => expect(onSaved).toHaveBeenCalledWith(saved, null));
    const body = stub.to(`POST ${recipesPath}`)[0]?.body as RecipeData;
    expect(body).toMatchObject({
      name: 'Garden salsa',
      category: 'salsa',
      productClass: 'acidified',
      tested: false,
      source: null,
      headspaceInches: 0.5,
      processing: {
        boilingWater: { bands: [1000, 6000, null], rows: [{ jarSize: 'pint', pack: 'hot', minutes: [15, 20, 25] }] },
      },
    });
    expect(body.processing.pressure).toBeUndefined();
  });

  it('asks a recipe marked tested for its source', async () => {
    const stub = stubFetch({});
    const { user } = setup();
    await fillValidRecipe(user);
    await user.click(screen.getByRole('checkbox', { name: 'This is a tested recipe' }));
    await user.click(screen.getByRole('button', { name: 'Add recipe' }));

    expectFieldError(
      screen.getByLabelText('Source citation'),
      'A tested recipe names its source (who tested and published it)',
    );
    expect(stub.requests).toHaveLength(0);
  });

  it("puts the server's field issues at the cells they name", async () => {
    // As if the server ran a stricter rule than this build of the app knows about.
    const message = 'A process time must be at most 300 minutes';
    stubFetch({
      [`POST ${recipesPath}`]: {
        status: 400,
        body: errorBody(400, 'validation_failed', 'The recipe is not valid', [
          { path: 'processing.boilingWater.rows.0.minutes.1', message },
        ]),
      },
    });
    const { user, onSaved } = setup();
    await fillValidRecipe(user);
    await user.click(screen.getByRole('button', { name: 'Add recipe' }));

    await waitFor(() =>
      expectFieldError(screen.getByLabelText('Minutes for pint jars, hot pack at 1,001–3,000 ft'), message),
    );
    expect(onSaved).not.toHaveBeenCalled();
  });
});
