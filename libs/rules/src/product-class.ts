import { z } from 'zod';

/**
 * Product classes of 21 CFR 114.3. `acid`: natural pH 4.6 or below (tomatoes below pH 4.7 are not classed
 * low-acid either). `acidified`: a low-acid food with acid or acid food added to a finished equilibrium pH of
 * 4.6 or below and water activity above 0.85 (pickles, salsas). `low-acid`: finished equilibrium pH above 4.6
 * and water activity above 0.85.
 */
export const PRODUCT_CLASSES = ['acid', 'acidified', 'low-acid'] as const;
export const productClassSchema = z.enum(PRODUCT_CLASSES, {
  error: `Product class must be one of: ${PRODUCT_CLASSES.join(', ')}`,
});
export type ProductClass = z.infer<typeof productClassSchema>;

/** The pH boundary of 21 CFR 114.3 between acid (or acidified) and low-acid foods. */
export const ACID_PH_LIMIT = 4.6;
/** Tomatoes and tomato products below this pH are not classed low-acid (21 CFR 114.3). */
export const TOMATO_PH_LIMIT = 4.7;
/** Low-acid and acidified foods both have a water activity above this (21 CFR 114.3). */
export const WATER_ACTIVITY_LIMIT = 0.85;

const phSchema = (what: string) =>
  z
    .number({ error: `${what} must be a number` })
    .min(0, `${what} must be between 0 and 14`)
    .max(14, `${what} must be between 0 and 14`);

/** What is known about a product, as measured by a laboratory. */
export const productMeasurementSchema = z
  .strictObject({
    /** pH of the food as it comes, before any acid is added. */
    naturalPh: phSchema('Natural pH'),
    /** True when acid or an acid food is added to bring the pH down. */
    acidAdded: z.boolean({ error: 'Say whether acid is added (true or false)' }),
    /** pH of the finished product once it has reached equilibrium; needed when acid is added. */
    equilibriumPh: phSchema('Equilibrium pH').optional(),
    waterActivity: z
      .number({ error: 'Water activity must be a number' })
      .min(0, 'Water activity must be between 0 and 1')
      .max(1, 'Water activity must be between 0 and 1'),
    /** Tomatoes and tomato products have their own pH limit. */
    tomato: z.boolean().default(false),
  })
  .refine((m) => !m.acidAdded || m.equilibriumPh !== undefined, {
    message: 'Give the finished equilibrium pH when acid is added',
    path: ['equilibriumPh'],
  });
export type ProductMeasurement = z.input<typeof productMeasurementSchema>;

export type ProductClassification =
  | { ok: true; productClass: ProductClass; rule: string }
  | { ok: false; reason: { code: 'invalid-measurement' | 'outside-definitions'; message: string } };

/**
 * Classify a product by pH and water activity per 21 CFR 114.3.
 *
 * A product with pH above 4.6 and water activity of 0.85 or below is neither acid nor low-acid under that
 * section; it is refused rather than guessed, because only a tested recipe can say how it must be processed.
 */
export function classifyProduct(input: ProductMeasurement): ProductClassification {
  const parsed = productMeasurementSchema.safeParse(input);
  if (!parsed.success) {
    const message = parsed.error.issues.map((i) => i.message).join('; ');
    return { ok: false, reason: { code: 'invalid-measurement', message } };
  }
  const m = parsed.data;
  const isAcidPh = (ph: number) => ph <= ACID_PH_LIMIT || (m.tomato && ph < TOMATO_PH_LIMIT);

  if (isAcidPh(m.naturalPh)) {
    return {
      ok: true,
      productClass: 'acid',
      rule:
        m.naturalPh <= ACID_PH_LIMIT
          ? 'Natural pH is 4.6 or below: an acid food (21 CFR 114.3)'
          : 'A tomato product below pH 4.7 is not classed low-acid (21 CFR 114.3)',
    };
  }
  if (m.waterActivity <= WATER_ACTIVITY_LIMIT) {
    return {
      ok: false,
      reason: {
        code: 'outside-definitions',
        message:
          'With pH above 4.6 and water activity 0.85 or below this product is neither an acid nor a low-acid food ' +
          'under 21 CFR 114.3. Follow a tested recipe and ask your local extension service.',
      },
    };
  }
  const finalPh = m.acidAdded ? (m.equilibriumPh ?? m.naturalPh) : m.naturalPh;
  if (m.acidAdded && finalPh <= ACID_PH_LIMIT) {
    return {
      ok: true,
      productClass: 'acidified',
      rule: 'A low-acid food brought to an equilibrium pH of 4.6 or below by added acid: an acidified food (21 CFR 114.3)',
    };
  }
  if (m.acidAdded && m.tomato && finalPh < TOMATO_PH_LIMIT) {
    return {
      ok: true,
      productClass: 'acid',
      rule: 'A tomato product with a finished equilibrium pH below 4.7 is not classed low-acid (21 CFR 114.3)',
    };
  }
  return {
    ok: true,
    productClass: 'low-acid',
    rule: 'Finished equilibrium pH above 4.6 and water activity above 0.85: a low-acid food (21 CFR 114.3)',
  };
}

/** Low-acid foods must be processed in a pressure canner (USDA Complete Guide to Home Canning, Guide 1). */
export function requiresPressureCanning(productClass: ProductClass): boolean {
  return productClass === 'low-acid';
}
