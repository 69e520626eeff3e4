import type { PrepStepKind, RecipeCategory, RecipeData } from '@jarday/contracts';
import {
  JAR_SIZE_LABELS,
  JAR_SIZES,
  type AmountUnit,
  type CanningMethod,
  type GaugeType,
  type PackStyle,
  type ProductClass,
} from '@jarday/rules';

export const CATEGORY_LABELS: Record<RecipeCategory, string> = {
  tomatoes: 'Tomatoes',
  salsa: 'Salsa',
  jam: 'Jam',
  pickles: 'Pickles',
  vegetables: 'Vegetables',
  fruit: 'Fruit',
  other: 'Other',
};

/** Product classes as 21 CFR 114.3 defines them, in a cook's words. */
export const PRODUCT_CLASS_LABELS: Record<ProductClass, string> = {
  acid: 'Acid food (natural pH 4.6 or below)',
  acidified: 'Acidified food (acid added to bring it to pH 4.6 or below)',
  'low-acid': 'Low-acid food (pH above 4.6): pressure canner only',
};

export const SHORT_CLASS_LABELS: Record<ProductClass, string> = {
  acid: 'Acid',
  acidified: 'Acidified',
  'low-acid': 'Low-acid',
};

export const PACK_LABELS: Record<PackStyle, string> = { hot: 'Hot pack', raw: 'Raw pack' };

export const METHOD_NAMES: Record<CanningMethod, string> = {
  'boiling-water': 'Boiling-water canner',
  pressure: 'Pressure canner',
};

export const GAUGE_NAMES: Record<GaugeType, string> = { weighted: 'weighted gauge', dial: 'dial gauge' };

export const PREP_KIND_LABELS: Record<PrepStepKind, string> = {
  blanch: 'Blanch',
  peel: 'Peel',
  chop: 'Chop',
  simmer: 'Simmer',
  'hot-hold': 'Keep hot',
  other: 'Other',
};

export const UNIT_LABELS: Record<AmountUnit, string> = {
  tsp: 'tsp',
  tbsp: 'Tbsp',
  'fl-oz': 'fl oz',
  cup: 'cup',
  pint: 'pint',
  quart: 'quart',
  gallon: 'gallon',
  mL: 'mL',
  L: 'L',
  oz: 'oz',
  lb: 'lb',
  g: 'g',
  kg: 'kg',
};

/** "Pint jars, hot pack". */
export const rowLabel = (row: { jarSize: keyof typeof JAR_SIZE_LABELS; pack: PackStyle }) =>
  `${JAR_SIZE_LABELS[row.jarSize]} jars, ${row.pack} pack`;

/** The canning methods a recipe has a tested table for. */
export function methodsOf(processing: RecipeData['processing']): CanningMethod[] {
  const methods: CanningMethod[] = [];
  if (processing.boilingWater) methods.push('boiling-water');
  if (processing.pressure) methods.push('pressure');
  return methods;
}

/** Jar sizes named in any of a recipe's tables, smallest first. */
export function jarSizesOf(processing: RecipeData['processing']): string[] {
  const named = new Set(
    [...(processing.boilingWater?.rows ?? []), ...(processing.pressure?.rows ?? [])].map((r) => r.jarSize),
  );
  return JAR_SIZES.filter((size) => named.has(size)).map((size) => JAR_SIZE_LABELS[size]);
}

/** "1 h 5 min", "30 s", "2 min 30 s". */
export function formatDuration(seconds: number): string {
  const h = Math.floor(seconds / 3600);
  const m = Math.floor((seconds % 3600) / 60);
  const s = seconds % 60;
  return [h ? `${h} h` : '', m ? `${m} min` : '', s ? `${s} s` : ''].filter(Boolean).join(' ') || '0 s';
}

/** A temperature given in °F, in the kitchen's units first: "180 °F (82 °C)" or "82 °C (180 °F)". */
export function formatTemperatureF(fahrenheit: number, units: 'us' | 'metric', decimals = 0): string {
  const celsius = ((fahrenheit - 32) * 5) / 9;
  const f = `${fahrenheit.toFixed(decimals)} °F`;
  const c = `${celsius.toFixed(decimals)} °C`;
  return units === 'us' ? `${f} (${c})` : `${c} (${f})`;
}
