import type { RecipeView } from '@jarday/contracts';
import { canner, orchardKitchen } from '../../../testing/fixtures';

const USDA = 'USDA Complete Guide to Home Canning (Agriculture Information Bulletin 539, 2015 revision, NCHFP)';

/**
 * A kitchen's copy of the whole-tomatoes starter. Times: USDA Complete Guide to Home Canning, Guide 3, tomatoes
 * packed in water: pints 40/45/50/55, quarts 45/50/55/60 minutes for 0-1,000 / 1,001-3,000 / 3,001-6,000 /
 * above 6,000 ft.
 */
export const tomatoesInWater = (over: Partial<RecipeView> = {}): RecipeView => ({
  id: '6b1f0c2e-4d3a-4b5c-9e8f-7a6b5c4d3e2f',
  kitchenId: orchardKitchen.id,
  copiedFrom: 'starter-tomatoes-in-water',
  createdAt: '2025-08-04T08:00:00.000Z',
  updatedAt: '2025-08-04T08:00:00.000Z',
  name: 'Whole or halved tomatoes in water',
  category: 'tomatoes',
  productClass: 'acid',
  acidification: 'tomato',
  tested: true,
  source: { citation: `${USDA}, Guide 3: tomatoes, whole or halved, packed in water`, url: null },
  headspaceInches: 0.5,
  processing: {
    boilingWater: {
      bands: [1000, 3000, 6000, null],
      rows: [
        { jarSize: 'pint', pack: 'hot', minutes: [40, 45, 50, 55] },
        { jarSize: 'pint', pack: 'raw', minutes: [40, 45, 50, 55] },
        { jarSize: 'quart', pack: 'hot', minutes: [45, 50, 55, 60] },
        { jarSize: 'quart', pack: 'raw', minutes: [45, 50, 55, 60] },
      ],
    },
  },
  produceYields: [{ jarSize: 'quart', jars: 7, produce: { value: 21, unit: 'lb' } }],
  batchYields: [],
  prepSteps: [
    {
      kind: 'blanch',
      label: 'Dip tomatoes in boiling water until the skins split, then into cold water',
      seconds: 60,
    },
    { kind: 'peel', label: 'Slip off the skins and cut out the cores', seconds: null },
  ],
  ingredients: [{ name: 'Ripe, firm tomatoes', amount: { value: 3, unit: 'lb' }, note: 'about 3 lb per quart jar' }],
  notes: '',
  ...over,
});

/** A kitchen's copy of the salsa starter: NCHFP tomato salsa, pints 15/20/25 min (0-1,000 / 1,001-6,000 / above). */
export const tomatoSalsa = (over: Partial<RecipeView> = {}): RecipeView => ({
  ...tomatoesInWater(),
  id: '0c9b8a7f-6e5d-4c3b-8a19-2f3e4d5c6b7a',
  copiedFrom: 'starter-tomato-salsa',
  name: 'Tomato salsa (tested recipe)',
  category: 'salsa',
  productClass: 'acidified',
  acidification: null,
  source: { citation: 'National Center for Home Food Preservation: tomato salsa', url: null },
  processing: {
    boilingWater: { bands: [1000, 6000, null], rows: [{ jarSize: 'pint', pack: 'hot', minutes: [15, 20, 25] }] },
  },
  produceYields: [],
  ...over,
});

/** The orchard kitchen's two canners: the boiling-water one of the shared fixtures, and a weighted pressure canner. */
export const bath = canner();
export const weightedCanner = canner({
  id: '8d7c6b5a-4f3e-4d2c-9b1a-0f9e8d7c6b5a',
  name: 'Tall pressure canner',
  method: 'pressure',
  gauge: 'weighted',
  capacity: { pint: 10, quart: 7 },
});
