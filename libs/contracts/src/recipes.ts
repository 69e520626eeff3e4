import {
  amountSchema,
  jarSizeSchema,
  packStyleSchema,
  recipeRulesFields,
  refineRecipeRules,
  type CautionId,
  type ProcessPlan,
  type RecipeRules,
} from '@jarday/rules';
import { z } from 'zod';

/** Prep steps a recipe names, each with the duration the step guide times. */
export const PREP_STEP_KINDS = ['blanch', 'peel', 'chop', 'simmer', 'hot-hold', 'other'] as const;
export const prepStepKindSchema = z.enum(PREP_STEP_KINDS, {
  error: `Step kind must be one of: ${PREP_STEP_KINDS.join(', ')}`,
});
export type PrepStepKind = z.infer<typeof prepStepKindSchema>;

export const prepStepSchema = z.strictObject({
  kind: prepStepKindSchema,
  label: z.string({ error: 'Describe the step' }).trim().min(1, 'Describe the step').max(160, 'At most 160 characters'),
  /** How long the step is timed for; none for untimed steps such as peeling. */
  seconds: z
    .number({ error: 'Duration must be a number of seconds' })
    .int('Whole seconds')
    .min(1, 'At least 1 second')
    .max(24 * 3600, 'At most 24 hours')
    .nullable()
    .default(null),
});
export type PrepStep = z.infer<typeof prepStepSchema>;

export const ingredientSchema = z.strictObject({
  name: z
    .string({ error: 'Name the ingredient' })
    .trim()
    .min(1, 'Name the ingredient')
    .max(120, 'At most 120 characters'),
  amount: amountSchema.nullable().default(null),
  note: z.string().trim().max(200, 'At most 200 characters').default(''),
});
export type Ingredient = z.infer<typeof ingredientSchema>;

export const recipeSourceSchema = z.strictObject({
  citation: z.string({ error: 'Give the source' }).trim().min(1, 'Give the source').max(300, 'At most 300 characters'),
  url: z.url({ error: 'Must be a web address' }).max(500).nullable().default(null),
});
export type RecipeSource = z.infer<typeof recipeSourceSchema>;

/** What kind of preserve a recipe makes; salsas carry their own caution (only spices and herbs may change). */
export const RECIPE_CATEGORIES = ['tomatoes', 'salsa', 'jam', 'pickles', 'vegetables', 'fruit', 'other'] as const;
export const recipeCategorySchema = z.enum(RECIPE_CATEGORIES, {
  error: `Category must be one of: ${RECIPE_CATEGORIES.join(', ')}`,
});
export type RecipeCategory = z.infer<typeof recipeCategorySchema>;

const recipeFields = {
  ...recipeRulesFields,
  category: recipeCategorySchema.default('other'),
  source: recipeSourceSchema.nullable().default(null),
  prepSteps: z.array(prepStepSchema).max(30, 'At most 30 steps').default([]),
  ingredients: z.array(ingredientSchema).max(60, 'At most 60 ingredients').default([]),
  notes: z.string().trim().max(4000, 'At most 4,000 characters').default(''),
};

/**
 * A recipe as the Recipe box stores it: the rules' fields plus what a cook reads. A recipe can only claim to be
 * tested with a source to name.
 */
export const recipeInputSchema = z.strictObject(recipeFields).superRefine((recipe, ctx) => {
  refineRecipeRules(recipe, ctx);
  if (recipe.tested && recipe.source === null) {
    ctx.addIssue({
      code: 'custom',
      path: ['source'],
      message: 'A tested recipe names its source (who tested and published it)',
    });
  }
});
export type RecipeInput = z.input<typeof recipeInputSchema>;
export type RecipeData = z.output<typeof recipeInputSchema>;

export interface RecipeView extends RecipeData {
  id: string;
  /** null for the built-in starter recipes, which every kitchen can read and copy. */
  kitchenId: string | null;
  /** The starter or recipe this one was copied from. */
  copiedFrom: string | null;
  createdAt: string;
  updatedAt: string;
}

/** Why a recipe that was tested is no longer marked so. */
export interface RecipeSaveNotice {
  untestedBecause: string | null;
}

export const copyRecipeSchema = z.strictObject({ recipeId: z.string().min(1).max(64) });

/** Query of the plan preview: the jar and pack to plan, in which of the kitchen's canners. */
export const planQuerySchema = z.strictObject({
  jarSize: jarSizeSchema,
  pack: packStyleSchema,
  cannerId: z.uuid({ error: 'Choose a canner' }),
});
export type PlanQuery = z.infer<typeof planQuerySchema>;

export type PlanAnswer =
  | { ok: true; plan: ProcessPlan; cautions: { id: CautionId; title: string; text: string }[] }
  | { ok: false; reason: { code: string; message: string } };

/** The rules' view of a stored recipe. */
export const rulesOf = (r: RecipeData): RecipeRules => ({
  name: r.name,
  productClass: r.productClass,
  processing: r.processing,
  headspaceInches: r.headspaceInches,
  acidification: r.acidification,
  tested: r.tested,
  produceYields: r.produceYields,
  batchYields: r.batchYields,
});
