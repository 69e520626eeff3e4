import { formatAmount, type DisplayAmount } from './amount-display.js';
import { altitudeInFeet } from './altitude.js';
import type { JarSize } from './jars.js';
import type { Altitude, CanningMethod } from './kitchen.js';
import type { Acidification } from './recipe.js';
import { inchesToMillimetres, type VolumeAmount } from './units.js';

/** Temperature of the simmering water empty jars are held in until filled, °F (USDA Guide 1). */
export const KEEP_JARS_HOT_F = 180;
/** Boiling-water processes shorter than this need sterilised jars (USDA Guide 1). */
export const STERILISE_UNDER_PROCESS_MINUTES = 10;

export type JarPreparation =
  { sterilise: true; minutes: number; text: string } | { sterilise: false; keepHotF: number; text: string };

/**
 * Minutes to boil empty jars to sterilise them: 10 at or below 1,000 ft, plus 1 for each additional 1,000 ft
 * (USDA Complete Guide to Home Canning, Guide 1). A part of a further 1,000 ft counts as a whole one, so the
 * time never falls short: 1,001-2,000 ft is 11 min, 2,001-3,000 ft 12 min.
 */
export function sterilisingMinutes(altitude: Altitude): number {
  const feet = altitudeInFeet(altitude);
  return feet <= 1000 ? 10 : 10 + Math.ceil((feet - 1000) / 1000);
}

/**
 * How to get jars ready: sterilise them only for boiling-water processes under 10 minutes; otherwise (and
 * always for pressure canning) keep clean jars hot in simmering water, about 180 °F, until filled (USDA Guide 1).
 */
export function jarPreparation(method: CanningMethod, processMinutes: number, altitude: Altitude): JarPreparation {
  if (method === 'boiling-water' && processMinutes < STERILISE_UNDER_PROCESS_MINUTES) {
    const minutes = sterilisingMinutes(altitude);
    return {
      sterilise: true,
      minutes,
      text: `Sterilise the jars: boil them ${minutes} minutes, then keep them in the hot water until you fill them.`,
    };
  }
  return {
    sterilise: false,
    keepHotF: KEEP_JARS_HOT_F,
    text: `Wash the jars and keep them hot in simmering water (about ${KEEP_JARS_HOT_F} °F) until you fill them.`,
  };
}

export interface Headspace {
  inches: number;
  /** Exact millimetres (1 in = 25.4 mm). */
  mm: number;
  /** e.g. "1/2 in (13 mm)". */
  label: string;
}

function inchesText(inches: number): string {
  const whole = Math.floor(inches);
  const eighths = Math.round((inches - whole) * 8);
  const divisor = eighths === 0 ? 1 : eighths % 4 === 0 ? 4 : eighths % 2 === 0 ? 2 : 1;
  const fraction = eighths === 0 ? '' : `${eighths / divisor}/${8 / divisor}`;
  return [whole > 0 ? String(whole) : '', fraction].filter(Boolean).join(' ') || '0';
}

/** A recipe's headspace in inches and millimetres, for the filling station. */
export function headspaceOf(inches: number): Headspace {
  const mm = inchesToMillimetres(inches);
  return { inches, mm, label: `${inchesText(inches)} in (${Math.round(mm)} mm)` };
}

export interface AcidOption {
  acid: 'bottled-lemon-juice' | 'citric-acid';
  amount: VolumeAmount;
  us: DisplayAmount;
  metric: DisplayAmount;
  /** e.g. "2 Tbsp bottled lemon juice (30 mL)". */
  text: string;
}

/**
 * Acid to add to each jar of tomatoes: per quart 2 Tbsp bottled lemon juice or 1/2 tsp citric acid; per pint
 * 1 Tbsp or 1/4 tsp (USDA Complete Guide to Home Canning, Guide 3).
 */
const TOMATO_ACID: Partial<Record<JarSize, Record<AcidOption['acid'], VolumeAmount>>> = {
  quart: { 'bottled-lemon-juice': { value: 2, unit: 'tbsp' }, 'citric-acid': { value: 0.5, unit: 'tsp' } },
  pint: { 'bottled-lemon-juice': { value: 1, unit: 'tbsp' }, 'citric-acid': { value: 0.25, unit: 'tsp' } },
};

const ACID_NAMES: Record<AcidOption['acid'], string> = {
  'bottled-lemon-juice': 'bottled lemon juice',
  'citric-acid': 'citric acid',
};

/**
 * The acid to add per jar (any one option), `[]` when the recipe needs none, or null when it needs acid but no
 * amount is published for that jar size.
 */
export function acidPerJar(acidification: Acidification | null, jarSize: JarSize): AcidOption[] | null {
  if (acidification === null) return [];
  const amounts = TOMATO_ACID[jarSize];
  if (amounts === undefined) return null;
  return (Object.keys(amounts) as AcidOption['acid'][]).map((acid) => {
    const amount = amounts[acid];
    const us = formatAmount(amount, 'us');
    const metric = formatAmount(amount, 'metric');
    return { acid, amount, us, metric, text: `${us.text} ${ACID_NAMES[acid]} (${metric.text})` };
  });
}
