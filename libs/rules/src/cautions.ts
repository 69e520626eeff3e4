import type { GaugeType, CanningMethod } from './kitchen.js';
import type { ProductClass } from './product-class.js';

/**
 * The standard cautions Jarday shows, in its own words. Each rests on the USDA Complete Guide to Home Canning
 * (1994; 2015 revision from NCHFP), NCHFP guidance, PNW 421 or 21 CFR 114, as noted beside it.
 */
export const CAUTION_IDS = [
  'tested-recipes',
  'salsa-changes',
  'altitude',
  'low-acid-pressure',
  'hot-jars-steam',
  'suspect-jars',
  'dial-gauge-check',
  'no-oven',
  'local-guidance',
  'unsealed-jar',
  'spoiled-lot',
] as const;
export type CautionId = (typeof CAUTION_IDS)[number];

export interface Caution {
  id: CautionId;
  title: string;
  text: string;
  /** The published guidance the caution rests on, for cautions shown on their own (a refusal, a report). */
  source?: string;
}

/** Where the spoilage and unsealed-jar cautions come from: shown with them so a person can read the original. */
export const SPOILAGE_SOURCE =
  'USDA Complete Guide to Home Canning, Guide 1, "Identifying and handling spoiled canned food" (NCHFP)';
export const UNSEALED_SOURCE = 'USDA Complete Guide to Home Canning, Guide 1 (1994; NCHFP)';

export const CAUTIONS: Record<CautionId, Caution> = {
  // USDA Guide 1: only tested recipes, processes and times are recommended.
  'tested-recipes': {
    id: 'tested-recipes',
    title: 'Use tested recipes',
    text:
      'Follow a tested recipe exactly: its ingredients, jar size, headspace and process time were checked ' +
      'together. Changing the proportions can make a safe recipe unsafe.',
  },
  // NCHFP salsa recipes: only spices and herbs may be changed.
  'salsa-changes': {
    id: 'salsa-changes',
    title: 'Salsa: change only spices and herbs',
    text:
      'In a tested salsa you may change the dried spices and herbs. Do not add more onions, peppers or other ' +
      'vegetables, and do not cut the vinegar or lemon juice.',
  },
  // USDA Guide 1: each recipe gives its own altitude bands.
  altitude: {
    id: 'altitude',
    title: 'Adjust for altitude',
    text:
      'Water boils at a lower temperature the higher you live, so process times (and pressures) go up with ' +
      'altitude. Check that your kitchen altitude is set correctly.',
  },
  // 21 CFR 114.3; USDA Guide 1.
  'low-acid-pressure': {
    id: 'low-acid-pressure',
    title: 'Low-acid foods need a pressure canner',
    text:
      'Vegetables, meat, poultry and fish are low-acid foods. Only a pressure canner gets them hot enough to ' +
      'destroy botulism spores; a boiling-water canner cannot, however long it runs.',
  },
  'hot-jars-steam': {
    id: 'hot-jars-steam',
    title: 'Hot jars and steam burn',
    text:
      'Jars, canner water and steam are far hotter than they look. Use a jar lifter, open lids away from your ' +
      'face, and keep children and pets away from the stove.',
  },
  // USDA Guide 1, spoilage and botulism.
  'suspect-jars': {
    id: 'suspect-jars',
    title: 'Never taste from a suspect jar',
    text:
      'Do not taste food from a jar that did not seal or that shows spoilage: a bulging lid, leaks, spurting ' +
      'liquid, rising bubbles, an odd colour or smell, or mould. Put sealed suspect jars in two bags in the ' +
      'trash. Detoxify leaking or unsealed ones by boiling them 30 minutes in water 1 inch above the jars.',
  },
  // PNW 421: have dial gauges checked for accuracy each year.
  'dial-gauge-check': {
    id: 'dial-gauge-check',
    title: 'Check a dial gauge every year',
    text:
      'Have a dial gauge tested for accuracy every year before the canning season; a gauge that reads wrong ' +
      'gives the wrong pressure. Your extension office can tell you where.',
  },
  // NCHFP: dry heat penetrates slowly and jars can break.
  'no-oven': {
    id: 'no-oven',
    title: 'Never process jars in an oven',
    text:
      'An oven does not heat food in jars safely: dry heat reaches the centre too slowly, and jars can burst. ' +
      'Keep empty jars hot in hot water rather than in an oven.',
  },
  'local-guidance': {
    id: 'local-guidance',
    title: 'Follow local guidance',
    text:
      'Jarday follows published home-canning guidance; it does not replace it. Follow your local extension ' +
      'service, and for food you sell, local food codes and licensed practice.',
  },
  // USDA Guide 1 (1994): an unsealed jar is refrigerated, or reprocessed within 24 hours with a new lid.
  'unsealed-jar': {
    id: 'unsealed-jar',
    title: 'A jar that did not seal',
    text:
      'Put it in the fridge and eat it within a few days, or reprocess it within 24 hours of lifting: a new ' +
      'lid, a clean rim, and the full process time again. After 24 hours, refrigerate it. Never store it on ' +
      'the shelf.',
    source: UNSEALED_SOURCE,
  },
  // USDA Guide 1, identifying and handling spoiled canned food; botulism.
  'spoiled-lot': {
    id: 'spoiled-lot',
    title: 'Spoilage reported: do not taste',
    text:
      'Do not taste the food, not even a little: spoiled food can carry botulism toxin, which can kill. ' +
      'Dispose of it as extension guidance says: sealed suspect jars go double-bagged into the trash; ' +
      'leaking or unsealed ones are detoxified first by boiling them 30 minutes in water 1 inch above the jars. ' +
      'Look carefully at every other jar of this lot (bulging lid, leaks, spurting liquid, rising bubbles, odd ' +
      'colour or smell, mould) before opening one, and ask your local extension service when in doubt.',
    source: SPOILAGE_SOURCE,
  },
};

/** Cautions in the order Jarday shows them. */
export const CAUTION_LIST: readonly Caution[] = CAUTION_IDS.map((id) => CAUTIONS[id]);

/** The cautions that apply to a process: always the general ones, plus those for pressure, low-acid food and dials. */
export function cautionsFor(process: {
  method: CanningMethod;
  productClass: ProductClass;
  gauge: GaugeType | null;
}): CautionId[] {
  const ids: CautionId[] = ['tested-recipes', 'altitude'];
  if (process.method === 'pressure' || process.productClass === 'low-acid') ids.push('low-acid-pressure');
  ids.push('hot-jars-steam', 'suspect-jars');
  if (process.method === 'pressure' && process.gauge === 'dial') ids.push('dial-gauge-check');
  ids.push('no-oven', 'local-guidance');
  return ids;
}

/**
 * The cautions to show with a recipe's plan: the process's own, and for a salsa the warning that only spices and
 * herbs may change (NCHFP), second in line because it is about the recipe itself.
 */
export function planCautions(cautionIds: readonly CautionId[], recipe: { isSalsa: boolean }): Caution[] {
  const ids = [...cautionIds];
  if (recipe.isSalsa) ids.splice(1, 0, 'salsa-changes');
  return ids.map((id) => CAUTIONS[id]);
}
