import type { LabelSheet } from '@jarday/contracts';

const IN = 72;
const MM = 72 / 25.4;

/** One sheet of labels in PDF points (1/72 in), measured from the top-left corner of the page. */
export interface SheetGeometry {
  page: { width: number; height: number };
  shape: 'rect' | 'round';
  /** Label width and height (a round label's diameter twice). */
  width: number;
  height: number;
  columns: number;
  rows: number;
  /** The top-left corner of the first label. */
  left: number;
  top: number;
  /** From one label's left (top) edge to the next one's: the label plus the gap. */
  pitchX: number;
  pitchY: number;
  name: string;
}

/**
 * The three sheets Jarday prints on, from the published dimensions of the common stock of each size. Every
 * entry adds up to its page: left + (columns - 1) * pitchX + width + left = page width, and the same down.
 * The round sheet's margins and pitches are from memory of the usual 20-up layout: print a test page on plain
 * paper and hold it against the sheet before using the labels.
 */
export const SHEETS: Record<LabelSheet, SheetGeometry> = {
  // US Letter, 4 x 2 in, 2 across and 5 down: 5/32 in sides, 1/2 in top, 3/16 in between the columns.
  'letter-rect-2x4': {
    name: 'US Letter, 2 x 4 in labels (10 per sheet)',
    page: { width: 8.5 * IN, height: 11 * IN },
    shape: 'rect',
    width: 4 * IN,
    height: 2 * IN,
    columns: 2,
    rows: 5,
    left: (5 / 32) * IN,
    top: 0.5 * IN,
    pitchX: 4.1875 * IN,
    pitchY: 2 * IN,
  },
  // US Letter, 2 in circles, 4 across and 5 down (lid labels): 1/8 in sides, 1/4 in top.
  'letter-round-2in': {
    name: 'US Letter, 2 in round lid labels (20 per sheet)',
    page: { width: 8.5 * IN, height: 11 * IN },
    shape: 'round',
    width: 2 * IN,
    height: 2 * IN,
    columns: 4,
    rows: 5,
    left: 0.125 * IN,
    top: 0.25 * IN,
    pitchX: (2 + 1 / 12) * IN,
    pitchY: 2.125 * IN,
  },
  // A4, 63.5 x 38.1 mm, 3 across and 7 down: 7.21 mm sides, 15.15 mm top, 2.54 mm between the columns.
  'a4-rect-63x38': {
    name: 'A4, 63.5 x 38.1 mm labels (21 per sheet)',
    page: { width: 210 * MM, height: 297 * MM },
    shape: 'rect',
    width: 63.5 * MM,
    height: 38.1 * MM,
    columns: 3,
    rows: 7,
    left: 7.21 * MM,
    top: 15.15 * MM,
    pitchX: 66.04 * MM,
    pitchY: 38.1 * MM,
  },
};

export const perSheet = (s: SheetGeometry) => s.columns * s.rows;

/** Where the n-th label (from 0) goes: its page and its top-left corner, filled row by row. */
export function labelSlot(s: SheetGeometry, n: number): { page: number; x: number; y: number } {
  const page = Math.floor(n / perSheet(s));
  const i = n % perSheet(s);
  return { page, x: s.left + (i % s.columns) * s.pitchX, y: s.top + Math.floor(i / s.columns) * s.pitchY };
}
