import { describe, expect, it } from 'vitest';
import { recipeRulesSchema, type RecipeRulesInput } from './recipe.js';
import {
  dillPickles,
  hotPackJam,
  pressureRulesOnly,
  tomatoesInWater,
  tomatoesRawNoLiquid,
  tomatoSalsa,
} from './testing/published-recipes.js';

const messages = (value: unknown) => {
  const result = recipeRulesSchema.safeParse(value);
  return result.success ? [] : result.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
};

describe('recipeRulesSchema', () => {
  it('accepts the published recipes and fills defaults', () => {
    for (const recipe of [
      tomatoesInWater,
      tomatoesRawNoLiquid,
      tomatoSalsa,
      hotPackJam,
      dillPickles,
      pressureRulesOnly,
    ]) {
      expect(messages(recipe)).toEqual([]);
    }
    expect(recipeRulesSchema.parse(hotPackJam)).toMatchObject({
      acidification: null,
      produceYields: [],
      batchYields: [],
    });
  });

  it('refuses a boiling-water table on a low-acid recipe (21 CFR 114.3; USDA Guide 1)', () => {
    const bad: RecipeRulesInput = { ...dillPickles, productClass: 'low-acid' };
    expect(messages(bad)).toEqual([
      'processing.boilingWater: A low-acid recipe must be processed in a pressure canner; remove its boiling-water table',
    ]);
  });

  it('allows tomato acidification only for pints and quarts (USDA Guide 3 publishes those amounts)', () => {
    const bad: RecipeRulesInput = {
      ...tomatoesInWater,
      processing: {
        boilingWater: { bands: [1000, null], rows: [{ jarSize: 'half-pint', pack: 'hot', minutes: [35, 40] }] },
      },
    };
    expect(messages(bad)).toEqual([
      'acidification: Tomato acid amounts are published for pints and quarts only, not for half-pint jars, hot pack',
    ]);
  });

  it('validates headspace in eighths of an inch', () => {
    expect(messages({ ...tomatoSalsa, headspaceInches: 0.3 })).toEqual([
      'headspaceInches: Give headspace in eighths of an inch, e.g. 0.25, 0.5, 1, 1.25',
    ]);
    expect(messages({ ...tomatoSalsa, headspaceInches: 0 })).toEqual([
      'headspaceInches: Headspace must be more than 0 in',
    ]);
    expect(messages({ ...tomatoSalsa, headspaceInches: 3 })).toEqual([
      'headspaceInches: Headspace must be at most 2 in',
    ]);
  });

  it('refuses duplicate yields for one jar size', () => {
    const bad = {
      ...tomatoesInWater,
      produceYields: [
        { jarSize: 'quart', jars: 7, produce: { value: 21, unit: 'lb' } },
        { jarSize: 'quart', jars: 1, produce: { value: 3, unit: 'lb' } },
      ],
    };
    expect(messages(bad)).toEqual(['produceYields.1: More than one yield for quart jars']);
  });

  it('gives clear messages for missing and misspelt fields', () => {
    const { tested: _tested, ...untold } = tomatoSalsa;
    expect(messages(untold)).toEqual(['tested: Say whether the recipe is a tested one (true or false)']);
    expect(messages({ ...tomatoSalsa, name: '  ' })).toEqual(['name: Name is required']);
    expect(messages({ ...tomatoSalsa, productClass: 'sweet' })).toEqual([
      'productClass: Product class must be one of: acid, acidified, low-acid',
    ]);
    // A misspelt optional field must not be silently dropped: "acidifcation" would lose the tomato acid.
    expect(messages({ ...tomatoesInWater, acidifcation: 'tomato' })).toEqual([': Unrecognized key: "acidifcation"']);
  });
});
