import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { stubFetch } from '../../../testing/fetch-stub';
import { orchardKitchen } from '../../../testing/fixtures';
import { renderWithProviders } from '../../../testing/render';
import { tomatoesInWater, tomatoSalsa } from '../testing/recipe-fixtures';
import { RecipeList } from './recipe-list';
import { StarterList } from './starter-list';

const starter = tomatoSalsa({ id: 'starter-tomato-salsa', kitchenId: null, copiedFrom: null });

describe('the Recipe box lists', () => {
  it('shows each recipe with its category, method and jar sizes, and badges only the untested one', () => {
    stubFetch({});
    const untested = tomatoesInWater({
      id: '1d2c3b4a-5e6f-4a7b-8c9d-0e1f2a3b4c5d',
      name: 'Our tomatoes',
      tested: false,
    });
    renderWithProviders(<RecipeList kitchenId={orchardKitchen.id} recipes={[tomatoesInWater(), untested]} />);

    const items = within(screen.getByRole('list', { name: 'Kitchen recipes' })).getAllByRole('listitem');
    expect(items).toHaveLength(2);
    expect(within(items[0]!).getByText('Tomatoes · Boiling-water canner · Pint, Quart')).toBeTruthy();
    expect(within(items[0]!).queryByText('Not a tested recipe')).toBeNull();
    expect(within(items[1]!).getByText('Not a tested recipe')).toBeTruthy();
    expect(within(items[1]!).getByText(/local extension service/)).toBeTruthy();
  });

  it('lets a lead copy a starter into the kitchen', async () => {
    const copy = tomatoSalsa({ copiedFrom: 'starter-tomato-salsa' });
    const stub = stubFetch({
      [`POST /api/kitchens/${orchardKitchen.id}/recipes/copy`]: { status: 201, body: copy },
      [`GET /api/kitchens/${orchardKitchen.id}/recipes`]: { status: 200, body: [copy] },
    });
    const onCopied = vi.fn();
    const { user } = renderWithProviders(
      <StarterList kitchenId={orchardKitchen.id} starters={[starter]} canCopy onCopied={onCopied} />,
    );

    await user.click(screen.getByRole('button', { name: `Copy to my kitchen: ${starter.name}` }));
    await waitFor(() => expect(onCopied).toHaveBeenCalledWith(copy));
    expect(stub.to(`POST /api/kitchens/${orchardKitchen.id}/recipes/copy`)[0]?.body).toEqual({
      recipeId: 'starter-tomato-salsa',
    });
  });

  it('offers no copy button to a helper or watcher', () => {
    stubFetch({});
    renderWithProviders(
      <StarterList kitchenId={orchardKitchen.id} starters={[starter]} canCopy={false} onCopied={vi.fn()} />,
    );
    expect(screen.getByRole('link', { name: starter.name })).toBeTruthy();
    expect(screen.queryByRole('button', { name: /Copy to my kitchen/ })).toBeNull();
  });
});
