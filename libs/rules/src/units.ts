// Apps type-check this lib from source; the reference brings the module declaration of the untyped package along.
// eslint-disable-next-line @typescript-eslint/triple-slash-reference
/// <reference path="./js-quantities.d.ts" />
import Qty from 'js-quantities';
import { z } from 'zod';

/**
 * Volume units a recipe may use. US customary units are the US liquid measures whose exact sizes NIST
 * Handbook 44, Appendix C defines (gallon = 231 in³); every conversion goes through js-quantities.
 */
export const VOLUME_UNITS = ['tsp', 'tbsp', 'fl-oz', 'cup', 'pint', 'quart', 'gallon', 'mL', 'L'] as const;
/** Mass units a recipe may use (avoirdupois pound = 0.45359237 kg exactly, NIST Handbook 44, Appendix C). */
export const MASS_UNITS = ['oz', 'lb', 'g', 'kg'] as const;

export const volumeUnitSchema = z.enum(VOLUME_UNITS, {
  error: `Volume unit must be one of: ${VOLUME_UNITS.join(', ')}`,
});
export const massUnitSchema = z.enum(MASS_UNITS, { error: `Mass unit must be one of: ${MASS_UNITS.join(', ')}` });
export type VolumeUnit = z.infer<typeof volumeUnitSchema>;
export type MassUnit = z.infer<typeof massUnitSchema>;
export type AmountUnit = VolumeUnit | MassUnit;

/** The js-quantities spelling of each unit; chosen so that no name is ambiguous ("pt" is also a point). */
const QTY_UNIT: Record<AmountUnit, string> = {
  tsp: 'tsp',
  tbsp: 'tbsp',
  'fl-oz': 'floz',
  cup: 'cup',
  pint: 'pint',
  quart: 'quart',
  gallon: 'gallon',
  mL: 'ml',
  L: 'l',
  oz: 'oz',
  lb: 'lb',
  g: 'g',
  kg: 'kg',
};

const amountValue = z
  .number({ error: 'An amount must be a number' })
  .finite('An amount must be a finite number')
  .positive('An amount must be more than 0');

export const volumeAmountSchema = z.strictObject({ value: amountValue, unit: volumeUnitSchema });
export const massAmountSchema = z.strictObject({ value: amountValue, unit: massUnitSchema });
export const amountSchema = z.union([volumeAmountSchema, massAmountSchema], {
  error: 'An amount is a positive number with a volume or mass unit',
});
export type VolumeAmount = z.infer<typeof volumeAmountSchema>;
export type MassAmount = z.infer<typeof massAmountSchema>;
export type Amount = VolumeAmount | MassAmount;

export function isVolumeUnit(unit: AmountUnit): unit is VolumeUnit {
  return (VOLUME_UNITS as readonly string[]).includes(unit);
}

/** Convert a number between two units with js-quantities; throws for a volume-to-mass conversion. */
export function convertValue(value: number, from: AmountUnit, to: AmountUnit): number {
  if (isVolumeUnit(from) !== isVolumeUnit(to)) {
    throw new TypeError(`Cannot convert ${from} to ${to}: one is a volume and the other a mass`);
  }
  return Qty(value, QTY_UNIT[from]).to(QTY_UNIT[to]).scalar;
}

/** The same amount in another unit of the same kind. */
export function convertAmount(amount: VolumeAmount, to: VolumeUnit): VolumeAmount;
export function convertAmount(amount: MassAmount, to: MassUnit): MassAmount;
export function convertAmount(amount: Amount, to: AmountUnit): Amount {
  return { value: convertValue(amount.value, amount.unit, to), unit: to };
}

/** A volume in millilitres. */
export function toMillilitres(amount: VolumeAmount): number {
  return convertValue(amount.value, amount.unit, 'mL');
}

/** A mass in grams. */
export function toGrams(amount: MassAmount): number {
  return convertValue(amount.value, amount.unit, 'g');
}

/** A mass in pounds. */
export function toPounds(amount: MassAmount): number {
  return convertValue(amount.value, amount.unit, 'lb');
}

/** Inches to millimetres (1 in = 25.4 mm exactly, NIST Handbook 44, Appendix C), through js-quantities. */
export function inchesToMillimetres(inches: number): number {
  return Qty(inches, 'in').to('mm').scalar;
}

const scaleFactorSchema = z
  .number({ error: 'The scale factor must be a number' })
  .finite('The scale factor must be a finite number')
  .positive('The scale factor must be more than 0');

/**
 * Scale an ingredient amount by a factor (e.g. 1.5 for one and a half batches), keeping its unit.
 * Throws a RangeError for a factor that is not a positive finite number.
 */
export function scaleAmount<A extends Amount>(amount: A, factor: number): A {
  const parsed = scaleFactorSchema.safeParse(factor);
  if (!parsed.success) throw new RangeError(parsed.error.issues[0]?.message ?? 'Invalid scale factor');
  const unit = QTY_UNIT[amount.unit];
  return { ...amount, value: Qty(amount.value, unit).mul(parsed.data).to(unit).scalar };
}

/** The factor that turns `fromBatches` of a recipe into `toBatches`. */
export function batchScaleFactor(fromBatches: number, toBatches: number): number {
  const from = scaleFactorSchema.parse(fromBatches);
  const to = scaleFactorSchema.parse(toBatches);
  return to / from;
}
