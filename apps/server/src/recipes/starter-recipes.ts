import { type RecipeInput, type RecipeView, recipeInputSchema } from '@jarday/contracts';

/**
 * The built-in starter set, written in Jarday's own words from published tables. Times, bands and headspaces:
 * USDA Complete Guide to Home Canning (Agriculture Information Bulletin 539; 1994 revision, 2015 revision from
 * NCHFP) and NCHFP's salsa recipe, as collected in shared/references.md. Where an ingredient list is part of the
 * tested recipe and not in those tables, the recipe sends the cook to the published source instead of guessing.
 */
const USDA = 'USDA Complete Guide to Home Canning (Agriculture Information Bulletin 539, 2015 revision, NCHFP)';
const STARTER_DATE = '2026-12-01T00:00:00.000Z';

const FOUR_BANDS = [1000, 3000, 6000, null];
const THREE_BANDS = [1000, 6000, null];

const hotJars = {
  kind: 'hot-hold',
  label: 'Keep clean jars hot in simmering water (about 180 °F) until filled',
} as const;
const tomatoDip = {
  kind: 'blanch',
  label: 'Dip tomatoes in boiling water until the skins split, 30 to 60 seconds, then into cold water',
  seconds: 60,
} as const;
const tomatoPeel = { kind: 'peel', label: 'Slip off the skins and cut out the cores' } as const;

const starters: Record<string, RecipeInput> = {
  'starter-tomatoes-in-water': {
    name: 'Whole or halved tomatoes in water',
    category: 'tomatoes',
    productClass: 'acid',
    acidification: 'tomato',
    tested: true,
    source: { citation: `${USDA}, Guide 3: tomatoes, whole or halved, packed in water` },
    headspaceInches: 0.5,
    processing: {
      boilingWater: {
        bands: FOUR_BANDS,
        rows: [
          { jarSize: 'pint', pack: 'hot', minutes: [40, 45, 50, 55] },
          { jarSize: 'pint', pack: 'raw', minutes: [40, 45, 50, 55] },
          { jarSize: 'quart', pack: 'hot', minutes: [45, 50, 55, 60] },
          { jarSize: 'quart', pack: 'raw', minutes: [45, 50, 55, 60] },
        ],
      },
    },
    produceYields: [
      { jarSize: 'quart', jars: 7, produce: { value: 21, unit: 'lb' } },
      { jarSize: 'pint', jars: 9, produce: { value: 13, unit: 'lb' } },
    ],
    prepSteps: [tomatoDip, tomatoPeel, hotJars],
    ingredients: [
      { name: 'Ripe, firm tomatoes', amount: { value: 3, unit: 'lb' }, note: 'about 3 lb per quart jar' },
      { name: 'Bottled lemon juice or citric acid', note: 'in each jar before filling: the amount is shown per jar' },
      { name: 'Boiling water', note: 'to cover the tomatoes, leaving the headspace' },
    ],
    notes:
      'Acidify every jar: per quart 2 tablespoons bottled lemon juice or 1/2 teaspoon citric acid; per pint ' +
      '1 tablespoon or 1/4 teaspoon. Fill, then cover with boiling water to 1/2 inch from the top.',
  },
  'starter-tomatoes-raw-no-liquid': {
    name: 'Tomatoes packed raw without added liquid',
    category: 'tomatoes',
    productClass: 'acid',
    acidification: 'tomato',
    tested: true,
    source: { citation: `${USDA}, Guide 3: tomatoes, whole or halved, packed raw without added liquid` },
    headspaceInches: 0.5,
    processing: {
      boilingWater: {
        bands: FOUR_BANDS,
        rows: [
          { jarSize: 'pint', pack: 'raw', minutes: [85, 90, 95, 100] },
          { jarSize: 'quart', pack: 'raw', minutes: [85, 90, 95, 100] },
        ],
      },
    },
    produceYields: [
      { jarSize: 'quart', jars: 7, produce: { value: 21, unit: 'lb' } },
      { jarSize: 'pint', jars: 9, produce: { value: 13, unit: 'lb' } },
    ],
    prepSteps: [tomatoDip, tomatoPeel, hotJars],
    ingredients: [
      { name: 'Ripe, firm tomatoes', amount: { value: 3, unit: 'lb' }, note: 'about 3 lb per quart jar' },
      { name: 'Bottled lemon juice or citric acid', note: 'in each jar before filling: the amount is shown per jar' },
    ],
    notes: 'Press the tomatoes into the jars until their own juice fills the spaces between them; no water is added.',
  },
  'starter-tomato-salsa': {
    name: 'Tomato salsa (tested recipe)',
    category: 'salsa',
    productClass: 'acidified',
    acidification: null,
    tested: true,
    source: { citation: 'National Center for Home Food Preservation: tomato salsa made with tomato paste or tomatoes' },
    headspaceInches: 0.5,
    processing: {
      boilingWater: { bands: THREE_BANDS, rows: [{ jarSize: 'pint', pack: 'hot', minutes: [15, 20, 25] }] },
    },
    batchYields: [],
    prepSteps: [
      tomatoDip,
      tomatoPeel,
      { kind: 'chop', label: 'Chop the vegetables as the tested recipe says' },
      hotJars,
    ],
    ingredients: [],
    notes:
      'Make the salsa exactly as the published tested recipe lists it, with its vinegar or bottled lemon juice: ' +
      'the acid and the proportion of vegetables make it safe to process in boiling water. Only spices and herbs ' +
      'may change. Jarday does not reproduce the ingredient list: copy it from the source into your kitchen copy.',
  },
  'starter-hot-packed-jam': {
    name: 'Hot-packed jam',
    category: 'jam',
    productClass: 'acid',
    acidification: null,
    tested: true,
    source: { citation: `${USDA}, Guide 7: jams and jellies, hot-packed` },
    headspaceInches: 0.25,
    processing: {
      boilingWater: {
        bands: THREE_BANDS,
        rows: [
          { jarSize: 'half-pint', pack: 'hot', minutes: [5, 10, 15] },
          { jarSize: 'pint', pack: 'hot', minutes: [5, 10, 15] },
        ],
      },
    },
    prepSteps: [
      { kind: 'hot-hold', label: 'Sterilise the jars (processes under 10 minutes need it), then keep them hot' },
      { kind: 'simmer', label: 'Cook the jam as the tested recipe for your fruit says' },
    ],
    ingredients: [],
    notes:
      'Use a tested jam recipe for the fruit you have (fruit, sugar, pectin and acid as it lists). Ladle hot jam ' +
      'into hot jars, leaving 1/4 inch headspace.',
  },
  'starter-quick-dill-pickles': {
    name: 'Quick fresh-pack dill pickles',
    category: 'pickles',
    productClass: 'acidified',
    acidification: null,
    tested: true,
    source: { citation: `${USDA}, Guide 6: quick fresh-pack dill pickles` },
    headspaceInches: 0.5,
    processing: {
      boilingWater: {
        bands: THREE_BANDS,
        rows: [
          { jarSize: 'pint', pack: 'raw', minutes: [10, 15, 20] },
          { jarSize: 'quart', pack: 'raw', minutes: [15, 20, 25] },
        ],
      },
    },
    prepSteps: [hotJars, { kind: 'simmer', label: 'Bring the vinegar brine to a boil as the tested recipe says' }],
    ingredients: [
      { name: 'Pickling cucumbers', note: 'fresh and firm' },
      { name: 'Vinegar', note: 'at least 5% acidity' },
    ],
    notes: 'Use vinegar of at least 5% acidity and the tested proportions of vinegar, water and salt.',
  },
  'starter-green-beans-pressure': {
    name: 'Green beans (pressure canned)',
    category: 'vegetables',
    productClass: 'low-acid',
    acidification: null,
    tested: true,
    source: { citation: `${USDA}, Guide 4: snap and Italian beans` },
    headspaceInches: 1,
    processing: {
      pressure: {
        rows: [
          // Minutes quoted from memory of USDA Guide 4 (not among the confirmed references): check the guide.
          { jarSize: 'pint', pack: 'hot', minutes: 20 },
          { jarSize: 'pint', pack: 'raw', minutes: 20 },
          { jarSize: 'quart', pack: 'hot', minutes: 25 },
          { jarSize: 'quart', pack: 'raw', minutes: 25 },
        ],
      },
    },
    prepSteps: [{ kind: 'chop', label: 'Trim the ends and cut or snap the beans into pieces' }, hotJars],
    ingredients: [{ name: 'Fresh, tender green beans' }, { name: 'Boiling water', note: 'to cover, leaving 1 inch' }],
    notes:
      'Low-acid: only a pressure canner reaches a safe temperature. Vent the canner 10 minutes before closing ' +
      'the vent. The process minutes here are to be checked against the current USDA guide before use.',
  },
};

/** Each starter, validated once at start-up by the same schema as a kitchen's own recipes. */
export const STARTER_RECIPES: readonly RecipeView[] = Object.entries(starters).map(([id, input]) => ({
  id,
  kitchenId: null,
  copiedFrom: null,
  createdAt: STARTER_DATE,
  updatedAt: STARTER_DATE,
  ...recipeInputSchema.parse(input),
}));

export const findStarter = (id: string) => STARTER_RECIPES.find((r) => r.id === id);
