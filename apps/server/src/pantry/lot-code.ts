import { randomBytes } from 'node:crypto';

/** A, B, ... Z, then AA, AB...: the batch's letter in its day, in the order the batches were added. */
export function batchLetter(index: number): string {
  if (!Number.isInteger(index) || index < 0) throw new RangeError('A batch index is a whole number from 0');
  let n = index + 1;
  let letters = '';
  while (n > 0) {
    const rem = (n - 1) % 26;
    letters = String.fromCharCode(65 + rem) + letters;
    n = Math.floor((n - 1) / 26);
  }
  return letters;
}

/** "2026-08-15" and the second batch -> "260815-B", the code printed on the lot's labels. */
export function lotCode(dayDate: string, batchIndex: number): string {
  const [y, m, d] = dayDate.split('-') as [string, string, string];
  return `${y.slice(2)}${m}${d}-${batchLetter(batchIndex)}`;
}

/**
 * What a label's QR code carries: 18 random bytes in base64url (24 characters), so the record of a jar cannot be
 * guessed from another label and never gives away the lot's id.
 */
export const newPublicToken = (): string => randomBytes(18).toString('base64url');
