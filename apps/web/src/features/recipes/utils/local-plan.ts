import type { PlanAnswer, RecipeCategory } from '@jarday/contracts';
import {
  planCautions,
  planProcess,
  recipeRulesSchema,
  type Altitude,
  type JarSize,
  type PackStyle,
  type RecipeRulesInput,
} from '@jarday/rules';
import type { CannerView } from '@jarday/contracts';
import { processingOf, type RecipeDraft } from './recipe-draft';

/**
 * Plans one load in the browser with the same rules the server runs (planProcess), for recipes the plan endpoint
 * cannot answer for yet: an unsaved draft, or a starter before it is copied. Like the server's answer, a salsa
 * also carries the salsa caution (NCHFP: only spices and herbs may change).
 */
export function planLocally(input: {
  recipe: RecipeRulesInput;
  category: RecipeCategory;
  jarSize: JarSize;
  pack: PackStyle;
  altitude: Altitude;
  canner: CannerView;
}): PlanAnswer {
  const result = planProcess({
    recipe: input.recipe,
    jarSize: input.jarSize,
    pack: input.pack,
    altitude: input.altitude,
    canner: input.canner,
  });
  if (!result.ok) return result;
  return {
    ok: true,
    plan: result.plan,
    cautions: planCautions(result.plan.cautionIds, { isSalsa: input.category === 'salsa' }),
  };
}

export type DraftRules = { ok: true; recipe: RecipeRulesInput } | { ok: false; problems: string[] };

/**
 * The rules' view of a draft, when the parts that decide the plan (class, tables, headspace, acid) are complete.
 * Fields the plan does not read, such as a missing name, do not hold the preview back.
 */
export function draftRules(d: RecipeDraft): DraftRules {
  const candidate = {
    name: d.name.trim() || 'This recipe',
    productClass: d.productClass,
    processing: processingOf(d),
    headspaceInches: d.headspace.trim() === '' ? undefined : Number(d.headspace),
    acidification: d.acidification === '' ? null : d.acidification,
    tested: d.tested,
    produceYields: d.produceYields,
    batchYields: d.batchYields,
  };
  const parsed = recipeRulesSchema.safeParse(candidate);
  if (parsed.success) return { ok: true, recipe: parsed.data };
  const problems = [...new Set(parsed.error.issues.map((i) => i.message))];
  return { ok: false, problems };
}
