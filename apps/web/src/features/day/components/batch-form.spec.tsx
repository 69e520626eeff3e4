import type { RecipeView } from '@jarday/contracts';
import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { stubFetch } from '../../../testing/fetch-stub';
import { renderWithProviders } from '../../../testing/render';
import { batch, DAY_ID, KITCHEN_ID } from '../testing/day-fixtures';
import { BatchForm, testedCombos } from './batch-form';

/** Quick dill pickles as the starter set has them: pints and quarts, raw pack (USDA Guide 6). */
const pickles: RecipeView = {
  id: 'a1b2c3d4-e5f6-4a7b-8c9d-0e1f2a3b4c5d',
  kitchenId: KITCHEN_ID,
  copiedFrom: 'starter-quick-dill-pickles',
  createdAt: '2025-09-01T10:00:00.000Z',
  updatedAt: '2025-09-01T10:00:00.000Z',
  name: 'Quick fresh-pack dill pickles',
  category: 'pickles',
  productClass: 'acidified',
  acidification: null,
  tested: true,
  source: { citation: 'USDA Complete Guide to Home Canning, Guide 6', url: null },
  headspaceInches: 0.5,
  processing: {
    boilingWater: {
      bands: [1000, 6000, null],
      rows: [
        { jarSize: 'pint', pack: 'raw', minutes: [10, 15, 20] },
        { jarSize: 'quart', pack: 'raw', minutes: [15, 20, 25] },
      ],
    },
  },
  prepSteps: [],
  ingredients: [],
  notes: '',
  batchYields: [],
  produceYields: [],
};

const batchesPath = `/api/kitchens/${KITCHEN_ID}/days/${DAY_ID}/batches`;

describe('adding a batch', () => {
  it('offers only the jar sizes and packs the recipe has a tested time for', () => {
    expect(testedCombos(pickles).map((c) => c.label)).toEqual(['pint jars, raw pack', 'quart jars, raw pack']);
  });

  it('sends the recipe, the chosen jars and pack, and the number of jars', async () => {
    const stub = stubFetch({ [`POST ${batchesPath}`]: { status: 201, body: batch() } });
    const { user } = renderWithProviders(<BatchForm kitchenId={KITCHEN_ID} dayId={DAY_ID} recipes={[pickles]} />);
    await user.click(screen.getByRole('combobox', { name: 'Jars and pack' }));
    await user.click(screen.getByRole('option', { name: 'quart jars, raw pack' }));
    await user.type(screen.getByLabelText('Number of jars'), '7');
    await user.click(screen.getByRole('button', { name: 'Add batch' }));
    await waitFor(() => expect(stub.to(`POST ${batchesPath}`)).toHaveLength(1));
    expect(stub.to(`POST ${batchesPath}`)[0]?.body).toEqual({
      recipeId: pickles.id,
      jarSize: 'quart',
      pack: 'raw',
      jars: 7,
    });
  });

  it('asks for the number of jars before sending', async () => {
    const stub = stubFetch({});
    const { user } = renderWithProviders(<BatchForm kitchenId={KITCHEN_ID} dayId={DAY_ID} recipes={[pickles]} />);
    await user.click(screen.getByRole('button', { name: 'Add batch' }));
    expect(await screen.findByText('Give either the number of jars or the produce weight')).toBeTruthy();
    expect(stub.requests).toHaveLength(0);
  });
});
