import { describe, expect, it } from 'vitest';
import { batchLetter, lotCode, newPublicToken } from './lot-code.js';

describe('lot codes', () => {
  it('letters batches A to Z, then AA, AB... like spreadsheet columns', () => {
    expect([0, 1, 25, 26, 27, 51, 52, 701, 702].map(batchLetter)).toEqual([
      'A',
      'B',
      'Z',
      'AA',
      'AB',
      'AZ',
      'BA',
      'ZZ',
      'AAA',
    ]);
    expect(() => batchLetter(-1)).toThrow(RangeError);
  });

  it('puts the canning date as YYMMDD before the letter', () => {
    expect(lotCode('2026-08-15', 1)).toBe('260815-B');
    expect(lotCode('2031-01-02', 0)).toBe('310102-A');
  });

  it('makes URL-safe tokens of 24 characters that do not repeat', () => {
    const tokens = new Set(Array.from({ length: 200 }, newPublicToken));
    expect(tokens.size).toBe(200);
    for (const token of tokens) expect(token).toMatch(/^[A-Za-z0-9_-]{24}$/);
  });
});
