import { z } from 'zod';
import { JAR_SIZE_LABELS, jarSizeSchema, type JarSize } from './jars.js';
import { describeRow, processingSchema, type PackStyle } from './process-table.js';
import { productClassSchema } from './product-class.js';
import { massAmountSchema } from './units.js';

/**
 * Acid a recipe needs added to each jar. `tomato`: tomatoes are acidified in the jar with bottled lemon juice
 * or citric acid (USDA Complete Guide to Home Canning, Guide 3); the amounts are published for pints and quarts.
 */
export const ACIDIFICATIONS = ['tomato'] as const;
export const acidificationSchema = z.enum(ACIDIFICATIONS, { error: 'Acidification must be tomato or null' });
export type Acidification = z.infer<typeof acidificationSchema>;

/** Jar sizes with a published tomato acid amount (USDA Guide 3). */
export const TOMATO_ACID_JAR_SIZES = ['pint', 'quart'] as const;

/** Headspace in inches: published values are quarter inches (1/4, 1/2, 1, 1 1/4 in, USDA Guide 1). */
export const headspaceInchesSchema = z
  .number({ error: 'Headspace must be a number of inches' })
  .positive('Headspace must be more than 0 in')
  .max(2, 'Headspace must be at most 2 in')
  .refine((inches) => Number.isInteger(inches * 8), 'Give headspace in eighths of an inch, e.g. 0.25, 0.5, 1, 1.25');

/** "About 21 lb of produce fills 7 quart jars" (USDA Guide 3 prints yields this way). */
export const produceYieldSchema = z.strictObject({
  jarSize: jarSizeSchema,
  jars: z.number({ error: 'Jars must be a number' }).int('Whole jars').positive('At least 1 jar'),
  produce: massAmountSchema,
});
export type ProduceYield = z.infer<typeof produceYieldSchema>;

/** "One batch of the recipe fills about 6 half-pints." */
export const batchYieldSchema = z.strictObject({
  jarSize: jarSizeSchema,
  jars: z.number({ error: 'Jars must be a number' }).positive('A batch fills more than 0 jars').max(100),
});
export type BatchYield = z.infer<typeof batchYieldSchema>;

/** The fields of the rules' view of a recipe, for schemas that extend it (e.g. a stored recipe with an id). */
export const recipeRulesFields = {
  name: z.string({ error: 'Name is required' }).trim().min(1, 'Name is required').max(120, 'At most 120 characters'),
  productClass: productClassSchema,
  processing: processingSchema,
  headspaceInches: headspaceInchesSchema,
  acidification: acidificationSchema.nullable().default(null),
  /** True only for a recipe tested and published by a recognised source (USDA, NCHFP, an extension service). */
  tested: z.boolean({ error: 'Say whether the recipe is a tested one (true or false)' }),
  produceYields: z.array(produceYieldSchema).default([]),
  batchYields: z.array(batchYieldSchema).default([]),
};

/**
 * What the canning rules need to know about a recipe. Cross-field rules: a low-acid recipe has no
 * boiling-water table (21 CFR 114.3; USDA Guide 1); tomato acidification is published only for pint and quart
 * jars; a jar size has at most one yield of each kind.
 */
export const recipeRulesSchema = z
  .strictObject(recipeRulesFields)
  .superRefine((recipe, ctx) => refineRecipeRules(recipe, ctx));

type RecipeRulesShape = z.infer<z.ZodObject<typeof recipeRulesFields>>;

/** The cross-field checks of {@link recipeRulesSchema}, for schemas that extend a recipe with more fields. */
export function refineRecipeRules(recipe: RecipeRulesShape, ctx: z.RefinementCtx): void {
  if (recipe.productClass === 'low-acid' && recipe.processing.boilingWater !== undefined) {
    ctx.addIssue({
      code: 'custom',
      path: ['processing', 'boilingWater'],
      message: 'A low-acid recipe must be processed in a pressure canner; remove its boiling-water table',
    });
  }
  if (recipe.acidification === 'tomato') {
    const rows: { jarSize: JarSize; pack: PackStyle }[] = [
      ...(recipe.processing.boilingWater?.rows ?? []),
      ...(recipe.processing.pressure?.rows ?? []),
    ];
    for (const row of rows) {
      if (!(TOMATO_ACID_JAR_SIZES as readonly string[]).includes(row.jarSize)) {
        ctx.addIssue({
          code: 'custom',
          path: ['acidification'],
          message: `Tomato acid amounts are published for pints and quarts only, not for ${describeRow(row.jarSize, row.pack)}`,
        });
      }
    }
  }
  for (const key of ['produceYields', 'batchYields'] as const) {
    const sizes = recipe[key].map((y) => y.jarSize);
    sizes.forEach((size, i) => {
      if (sizes.indexOf(size) !== i) {
        ctx.addIssue({
          code: 'custom',
          path: [key, i],
          message: `More than one yield for ${JAR_SIZE_LABELS[size].toLowerCase()} jars`,
        });
      }
    });
  }
}

/** A validated recipe, as the rules use it. */
export type RecipeRules = z.infer<typeof recipeRulesSchema>;
/** A recipe as given, before defaults are applied. */
export type RecipeRulesInput = z.input<typeof recipeRulesSchema>;
