import type { JarOutcome, SealResult } from '@jarday/contracts';

/** How seal results read on a tile, short enough for a 104 px square. */
export const SEAL_LABELS: Record<SealResult, string> = {
  sealed: 'Sealed',
  unsealed: 'Not sealed',
  broken: 'Broken',
};

export const OUTCOME_LABELS: Record<JarOutcome, string> = {
  store: 'Store',
  fridge: 'Fridge, eat within days',
  reprocess: 'Reprocess with a new lid',
  discard: 'Discard',
};

/** One tap moves a jar on: unchecked, sealed, not sealed, broken, and round to sealed again. */
export function nextSeal(result: SealResult | null): SealResult {
  if (result === 'sealed') return 'unsealed';
  if (result === 'unsealed') return 'broken';
  return 'sealed';
}
