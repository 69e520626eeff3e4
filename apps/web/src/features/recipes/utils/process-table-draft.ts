import { bandLabel } from '@jarday/rules';
import { newKey, type BoilingWaterDraft } from './recipe-draft';

const wholeFeet = (text: string): number | undefined => {
  const n = Number(text.trim());
  return text.trim() !== '' && Number.isInteger(n) && n > 0 ? n : undefined;
};

/** The bounds as far as they can be read yet: undefined where the cook has not typed a whole number of feet. */
export function draftBounds(bw: Pick<BoilingWaterDraft, 'bands' | 'openTop'>): (number | null | undefined)[] {
  const last = bw.bands.length - 1;
  return bw.bands.map((b, i) => (i === last && bw.openTop ? null : wholeFeet(b.bound)));
}

/**
 * Column labels as the tables print them ("0–1,000 ft", "Above 6,000 ft"); while a bound needed for a label is
 * not yet a whole number of feet, "Band 3" (or "Above band 3" for the open top).
 */
export function draftBandLabels(bw: Pick<BoilingWaterDraft, 'bands' | 'openTop'>): string[] {
  const bounds = draftBounds(bw);
  return bounds.map((bound, i) => {
    const previous = i === 0 ? 0 : bounds[i - 1];
    if (previous === undefined || previous === null) return bound === null ? `Above band ${i}` : `Band ${i + 1}`;
    if (bound === undefined) return `Band ${i + 1}`;
    return bandLabel(bounds as (number | null)[], i);
  });
}

/**
 * A new, empty band: just below the open top band when there is one (splitting "above 6,000 ft"), otherwise at
 * the top. Every row gets an empty minutes cell for it.
 */
export function addBand(bw: BoilingWaterDraft): BoilingWaterDraft {
  const at = bw.openTop ? bw.bands.length - 1 : bw.bands.length;
  const insert = <T>(list: T[], item: T) => [...list.slice(0, at), item, ...list.slice(at)];
  return {
    ...bw,
    bands: insert(bw.bands, { key: newKey(), bound: '' }),
    rows: bw.rows.map((r) => ({ ...r, minutes: insert(r.minutes, '') })),
  };
}

/** Removes a band and its minutes from every row; with an open top, the band below becomes the open one. */
export function removeBand(bw: BoilingWaterDraft, index: number): BoilingWaterDraft {
  if (bw.bands.length <= 1) return bw;
  const drop = <T>(list: T[]) => list.filter((_, i) => i !== index);
  return { ...bw, bands: drop(bw.bands), rows: bw.rows.map((r) => ({ ...r, minutes: drop(r.minutes) })) };
}
