import { LABEL_SHEETS } from '@jarday/contracts';
import { describe, expect, it } from 'vitest';
import { labelSlot, perSheet, SHEETS } from './label-sheets.js';

describe('label sheets', () => {
  it.each(LABEL_SHEETS)('%s: margins, labels and gaps add up to the page, and no two labels overlap', (name) => {
    const s = SHEETS[name];
    // Symmetric sides; the top and bottom margins are equal on all three sheets too.
    expect(2 * s.left + (s.columns - 1) * s.pitchX + s.width).toBeCloseTo(s.page.width, 1);
    expect(2 * s.top + (s.rows - 1) * s.pitchY + s.height).toBeCloseTo(s.page.height, 1);
    expect(s.pitchX).toBeGreaterThanOrEqual(s.width);
    expect(s.pitchY).toBeGreaterThanOrEqual(s.height);
  });

  it('holds 10, 20 and 21 labels of the published sizes (2 x 4 in, 2 in round, 63.5 x 38.1 mm)', () => {
    expect(LABEL_SHEETS.map((n) => perSheet(SHEETS[n]))).toEqual([10, 20, 21]);
    expect([SHEETS['letter-rect-2x4'].width / 72, SHEETS['letter-rect-2x4'].height / 72]).toEqual([4, 2]);
    expect(SHEETS['letter-round-2in'].width / 72).toBe(2);
    expect(SHEETS['a4-rect-63x38'].width / (72 / 25.4)).toBeCloseTo(63.5, 6);
    expect(SHEETS['a4-rect-63x38'].height / (72 / 25.4)).toBeCloseTo(38.1, 6);
  });

  it('fills row by row and starts a new page after the last slot', () => {
    const s = SHEETS['letter-rect-2x4'];
    expect(labelSlot(s, 0)).toEqual({ page: 0, x: s.left, y: s.top });
    expect(labelSlot(s, 1)).toEqual({ page: 0, x: s.left + s.pitchX, y: s.top });
    expect(labelSlot(s, 2)).toEqual({ page: 0, x: s.left, y: s.top + s.pitchY });
    expect(labelSlot(s, 10)).toEqual({ page: 1, x: s.left, y: s.top });
  });
});
