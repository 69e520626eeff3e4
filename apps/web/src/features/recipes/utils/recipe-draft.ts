import type { PrepStepKind, RecipeCategory, RecipeData } from '@jarday/contracts';
import type { AmountUnit, JarSize, PackStyle, ProductClass } from '@jarday/rules';
import { numberOrUndefined } from '../../../lib/form-errors';

/** Rows of an editable list carry a key of their own, so React keeps each input with its row when rows move. */
let lastKey = 0;
export const newKey = () => `d${++lastKey}`;

export interface BandDraft {
  key: string;
  /** Upper bound in feet, as typed; ignored for the open top band. */
  bound: string;
}
export interface BoilingRowDraft {
  key: string;
  jarSize: JarSize;
  pack: PackStyle;
  /** One entry per band, as typed. */
  minutes: string[];
}
export interface PressureRowDraft {
  key: string;
  jarSize: JarSize;
  pack: PackStyle;
  minutes: string;
}
export interface BoilingWaterDraft {
  bands: BandDraft[];
  /** The top band has no upper bound ("above 6,000 ft"), as published tables print it. */
  openTop: boolean;
  rows: BoilingRowDraft[];
}
export interface PrepStepDraft {
  key: string;
  kind: PrepStepKind;
  label: string;
  minutes: string;
  seconds: string;
}
export interface IngredientDraft {
  key: string;
  name: string;
  value: string;
  unit: AmountUnit | '';
  note: string;
}

/** The editor's state: what the cook typed, text for every number, so half-typed values survive. */
export interface RecipeDraft {
  name: string;
  category: RecipeCategory;
  productClass: ProductClass;
  tested: boolean;
  citation: string;
  url: string;
  headspace: string;
  acidification: '' | 'tomato';
  boilingWater: BoilingWaterDraft | null;
  pressure: { rows: PressureRowDraft[] } | null;
  prepSteps: PrepStepDraft[];
  ingredients: IngredientDraft[];
  notes: string;
  /** Not edited here; kept so that a save does not drop them. */
  produceYields: RecipeData['produceYields'];
  batchYields: RecipeData['batchYields'];
}

const text = (n: number | null | undefined) => (n === null || n === undefined ? '' : String(n));

/** The band layout most USDA tables print (0-1,000 / 1,001-3,000 / 3,001-6,000 / above 6,000 ft); times left blank. */
export function emptyDraft(): RecipeDraft {
  const bands = [1000, 3000, 6000, null].map((b) => ({ key: newKey(), bound: text(b) }));
  return {
    name: '',
    category: 'other',
    productClass: 'acid',
    tested: false,
    citation: '',
    url: '',
    headspace: '',
    acidification: '',
    boilingWater: { bands, openTop: true, rows: [emptyBoilingRow(bands.length)] },
    pressure: null,
    prepSteps: [],
    ingredients: [],
    notes: '',
    produceYields: [],
    batchYields: [],
  };
}

export const emptyBoilingRow = (bands: number): BoilingRowDraft => ({
  key: newKey(),
  jarSize: 'pint',
  pack: 'hot',
  minutes: Array.from({ length: bands }, () => ''),
});
export const emptyPressureRow = (): PressureRowDraft => ({ key: newKey(), jarSize: 'pint', pack: 'hot', minutes: '' });
export const emptyPrepStep = (): PrepStepDraft => ({
  key: newKey(),
  kind: 'other',
  label: '',
  minutes: '',
  seconds: '',
});
export const emptyIngredient = (): IngredientDraft => ({ key: newKey(), name: '', value: '', unit: '', note: '' });

/** A stored recipe as the editor holds it. */
export function draftFromRecipe(r: RecipeData): RecipeDraft {
  const bw = r.processing.boilingWater;
  return {
    name: r.name,
    category: r.category,
    productClass: r.productClass,
    tested: r.tested,
    citation: r.source?.citation ?? '',
    url: r.source?.url ?? '',
    headspace: text(r.headspaceInches),
    acidification: r.acidification ?? '',
    boilingWater: bw
      ? {
          bands: bw.bands.map((b) => ({ key: newKey(), bound: text(b) })),
          openTop: bw.bands[bw.bands.length - 1] === null,
          rows: bw.rows.map((row) => ({ key: newKey(), ...row, minutes: row.minutes.map(text) })),
        }
      : null,
    pressure: r.processing.pressure
      ? { rows: r.processing.pressure.rows.map((row) => ({ key: newKey(), ...row, minutes: text(row.minutes) })) }
      : null,
    prepSteps: r.prepSteps.map((s) => ({
      key: newKey(),
      kind: s.kind,
      label: s.label,
      minutes: s.seconds === null ? '' : text(Math.floor(s.seconds / 60)),
      seconds: s.seconds === null ? '' : text(s.seconds % 60),
    })),
    ingredients: r.ingredients.map((i) => ({
      key: newKey(),
      name: i.name,
      value: text(i.amount?.value),
      unit: i.amount?.unit ?? '',
      note: i.note,
    })),
    notes: r.notes,
    produceYields: r.produceYields,
    batchYields: r.batchYields,
  };
}

/** Minutes and seconds as typed to whole seconds; both empty means an untimed step. */
function durationOf(step: PrepStepDraft): number | null | undefined {
  if (step.minutes.trim() === '' && step.seconds.trim() === '') return null;
  const minutes = numberOrUndefined(step.minutes) ?? 0;
  const seconds = numberOrUndefined(step.seconds) ?? 0;
  return minutes * 60 + seconds;
}

/** The process tables of a draft, in the shape the schema checks. */
export function processingOf(d: Pick<RecipeDraft, 'boilingWater' | 'pressure'>): unknown {
  const bw = d.boilingWater;
  const last = (bw?.bands.length ?? 0) - 1;
  return {
    ...(bw
      ? {
          boilingWater: {
            bands: bw.bands.map((b, i) => (i === last && bw.openTop ? null : numberOrUndefined(b.bound))),
            rows: bw.rows.map((r) => ({ jarSize: r.jarSize, pack: r.pack, minutes: r.minutes.map(numberOrUndefined) })),
          },
        }
      : {}),
    ...(d.pressure
      ? {
          pressure: {
            rows: d.pressure.rows.map((r) => ({
              jarSize: r.jarSize,
              pack: r.pack,
              minutes: numberOrUndefined(r.minutes),
            })),
          },
        }
      : {}),
  };
}

/** What the draft asks the server to store; checked with the server's own schema before it is sent. */
export function draftToInput(d: RecipeDraft): unknown {
  const citation = d.citation.trim();
  const url = d.url.trim();
  return {
    name: d.name,
    category: d.category,
    productClass: d.productClass,
    tested: d.tested,
    // A web address without a citation still goes in, so the schema can ask for the citation.
    source: citation === '' && url === '' ? null : { citation, url: url === '' ? null : url },
    headspaceInches: numberOrUndefined(d.headspace),
    acidification: d.acidification === '' ? null : d.acidification,
    processing: processingOf(d),
    prepSteps: d.prepSteps.map((s) => ({ kind: s.kind, label: s.label, seconds: durationOf(s) })),
    ingredients: d.ingredients.map((i) => ({
      name: i.name,
      amount:
        i.value.trim() === '' && i.unit === ''
          ? null
          : { value: numberOrUndefined(i.value), unit: i.unit === '' ? undefined : i.unit },
      note: i.note,
    })),
    notes: d.notes,
    produceYields: d.produceYields,
    batchYields: d.batchYields,
  };
}
