import type { LabelSheet, LotEntryKind } from '@jarday/contracts';

export const ENTRY_LABELS: Record<LotEntryKind, string> = {
  eaten: 'Eaten',
  gift: 'Given away',
  spoiled: 'Spoiled',
};

/** The label sheets the server prints, described by the paper and the label's shape. */
export const SHEET_LABELS: Record<LabelSheet, string> = {
  'letter-rect-2x4': 'US Letter paper, 2 × 4 in rectangles',
  'letter-round-2in': 'US Letter paper, 2 in rounds (lids)',
  'a4-rect-63x38': 'A4 paper, 63 × 38 mm rectangles',
};

/** Today as this device's calendar shows it, "YYYY-MM-DD". */
export function localToday(now = new Date()): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

/** A calendar date as the reader's locale writes it; noon keeps it on the same day in every time zone. */
export function calendarDate(date: string): string {
  return new Date(`${date}T12:00:00`).toLocaleDateString(undefined, { dateStyle: 'medium' });
}

export const jarsWord = (n: number) => `${n} ${n === 1 ? 'jar' : 'jars'}`;
