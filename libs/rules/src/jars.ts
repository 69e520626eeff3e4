import { z } from 'zod';

/**
 * Jar sizes a recipe's process table can name. Volumes are nominal US customary capacities,
 * converted with the exact factors of NIST Handbook 44, Appendix C.
 */
export const JAR_SIZES = ['half-pint', 'pint', 'pint-and-a-half', 'quart', 'half-gallon'] as const;
export const jarSizeSchema = z.enum(JAR_SIZES, { error: `Jar size must be one of: ${JAR_SIZES.join(', ')}` });
export type JarSize = z.infer<typeof jarSizeSchema>;

export const JAR_SIZE_LABELS: Record<JarSize, string> = {
  'half-pint': 'Half-pint',
  pint: 'Pint',
  'pint-and-a-half': 'Pint and a half',
  quart: 'Quart',
  'half-gallon': 'Half-gallon',
};
