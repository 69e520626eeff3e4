import type { UnitSystem } from './kitchen.js';
import { convertValue, isVolumeUnit, type Amount, type AmountUnit } from './units.js';

/** An amount as a cook reads it: rounded to what kitchen measures can hold. */
export interface DisplayAmount {
  /** The rounded number in `unit`. */
  value: number;
  unit: AmountUnit;
  /** e.g. "2 Tbsp", "1 1/4 cups", "30 mL", "454 g", "9.53 kg". */
  text: string;
}

/**
 * One rung of a display ladder: a unit, the step amounts are rounded to in it, and the rounded value at which
 * the next (larger) unit takes over. US steps are fractions a measuring set holds; metric steps keep about two
 * significant figures for spoons and jugs and whole grams on a kitchen scale.
 */
interface Rung {
  unit: AmountUnit;
  /** Candidate fraction denominators (US), or a decimal step (metric). */
  round: { denominators: number[] } | { step: number; decimals: number };
  below: number;
}

const US_VOLUME: Rung[] = [
  { unit: 'tsp', round: { denominators: [8] }, below: 3 },
  { unit: 'tbsp', round: { denominators: [2] }, below: 4 },
  { unit: 'cup', round: { denominators: [4, 3] }, below: 4 },
  { unit: 'quart', round: { denominators: [4] }, below: 4 },
  { unit: 'gallon', round: { denominators: [4] }, below: Infinity },
];
const US_MASS: Rung[] = [
  { unit: 'oz', round: { denominators: [4] }, below: 16 },
  { unit: 'lb', round: { denominators: [4] }, below: Infinity },
];
const METRIC_VOLUME: Rung[] = [
  { unit: 'mL', round: { step: 0.25, decimals: 2 }, below: 5 },
  { unit: 'mL', round: { step: 0.5, decimals: 1 }, below: 25 },
  { unit: 'mL', round: { step: 5, decimals: 0 }, below: 250 },
  { unit: 'mL', round: { step: 10, decimals: 0 }, below: 1000 },
  { unit: 'L', round: { step: 0.05, decimals: 2 }, below: Infinity },
];
const METRIC_MASS: Rung[] = [
  { unit: 'g', round: { step: 0.5, decimals: 1 }, below: 10 },
  { unit: 'g', round: { step: 1, decimals: 0 }, below: 1000 },
  { unit: 'kg', round: { step: 0.01, decimals: 2 }, below: Infinity },
];

const LABELS: Record<AmountUnit, [singular: string, plural: string]> = {
  tsp: ['tsp', 'tsp'],
  tbsp: ['Tbsp', 'Tbsp'],
  'fl-oz': ['fl oz', 'fl oz'],
  cup: ['cup', 'cups'],
  pint: ['pint', 'pints'],
  quart: ['quart', 'quarts'],
  gallon: ['gallon', 'gallons'],
  mL: ['mL', 'mL'],
  L: ['L', 'L'],
  oz: ['oz', 'oz'],
  lb: ['lb', 'lb'],
  g: ['g', 'g'],
  kg: ['kg', 'kg'],
};

interface Rounded {
  value: number;
  number: string;
}

const gcd = (a: number, b: number): number => (b === 0 ? a : gcd(b, a % b));

function roundFraction(x: number, denominators: number[]): Rounded {
  let best = { whole: 0, num: 0, den: 1, value: 0 };
  let bestError = Infinity;
  for (const den of denominators) {
    const num = Math.round(x * den);
    const error = Math.abs(x - num / den);
    if (error < bestError - 1e-12) {
      bestError = error;
      const rest = num % den;
      const common = gcd(rest, den);
      best = { whole: Math.floor(num / den), num: rest / common, den: den / common, value: num / den };
    }
  }
  const fraction = best.num === 0 ? '' : `${best.num}/${best.den}`;
  const number = best.whole === 0 ? fraction || '0' : fraction ? `${best.whole} ${fraction}` : String(best.whole);
  return { value: best.value, number };
}

function roundStep(x: number, step: number, decimals: number): Rounded {
  const value = Number((Math.round(x / step) * step).toFixed(decimals));
  return { value, number: String(value) };
}

function roundOn(rung: Rung, x: number): Rounded {
  return 'denominators' in rung.round
    ? roundFraction(x, rung.round.denominators)
    : roundStep(x, rung.round.step, rung.round.decimals);
}

/**
 * Present an amount to a cook in the kitchen's unit system, in the unit a kitchen would measure it with:
 * 2 Tbsp -> "30 mL" (metric), 1 lb -> "454 g", 30 mL -> "2 Tbsp" (US), 1 kg -> "2 1/4 lb".
 * Conversion goes through js-quantities; only the rounding is ours.
 */
export function formatAmount(amount: Amount, system: UnitSystem): DisplayAmount {
  const volume = isVolumeUnit(amount.unit);
  const ladder = system === 'us' ? (volume ? US_VOLUME : US_MASS) : volume ? METRIC_VOLUME : METRIC_MASS;
  const first = ladder[0];
  if (first === undefined) throw new Error('Empty display ladder');

  for (const rung of ladder) {
    const exact = convertValue(amount.value, amount.unit, rung.unit);
    const rounded = roundOn(rung, exact);
    if (rounded.value < rung.below) {
      if (rounded.value === 0) {
        // Too small for the finest step: say so rather than print "0".
        return { value: exact, unit: rung.unit, text: `less than ${stepText(first)}` };
      }
      const [one, many] = LABELS[rung.unit];
      return { value: rounded.value, unit: rung.unit, text: `${rounded.number} ${rounded.value > 1 ? many : one}` };
    }
  }
  throw new Error('Unreachable: the last rung of a display ladder has no upper limit');
}

function stepText(rung: Rung): string {
  const [one] = LABELS[rung.unit];
  if ('denominators' in rung.round) return `1/${Math.max(...rung.round.denominators)} ${one}`;
  return `${rung.round.step} ${one}`;
}
