import type { CannerView } from '@jarday/contracts';
import type { CanningMethod, JarSize, PackStyle } from '@jarday/rules';
import { useState } from 'react';

export interface PlanRow {
  jarSize: JarSize;
  pack: PackStyle;
}
/** The rows of each table a recipe has; null where it has no table for that method. */
export type PlanTables = Record<CanningMethod, readonly PlanRow[] | null>;

/** The tables of a saved recipe, as the chooser reads them. */
export const tablesOf = (processing: {
  boilingWater?: { rows: readonly PlanRow[] };
  pressure?: { rows: readonly PlanRow[] };
}): PlanTables => ({
  'boiling-water': processing.boilingWater?.rows ?? null,
  pressure: processing.pressure?.rows ?? null,
});

export const rowKey = (r: PlanRow) => `${r.jarSize}/${r.pack}`;

/** Every jar size and pack the recipe has a tested time for, in either canner, each once. */
export function planRows(tables: PlanTables): PlanRow[] {
  const seen = new Map<string, PlanRow>();
  for (const r of [...(tables['boiling-water'] ?? []), ...(tables.pressure ?? [])]) {
    if (!seen.has(rowKey(r))) seen.set(rowKey(r), { jarSize: r.jarSize, pack: r.pack });
  }
  return [...seen.values()];
}

/**
 * The jar, pack and canner chosen for a plan preview. Until the cook picks, and whenever a pick stops existing
 * (a row removed in the editor), it falls back to a canner that suits the recipe and that canner's first row.
 */
export function usePlanChoice(tables: PlanTables, canners: readonly CannerView[]) {
  const [pickedRow, setRow] = useState<string | null>(null);
  const [pickedCanner, setCanner] = useState<string | null>(null);
  const rows = planRows(tables);
  const canner =
    canners.find((c) => c.id === pickedCanner) ?? canners.find((c) => tables[c.method] !== null) ?? canners[0] ?? null;
  const row =
    rows.find((r) => rowKey(r) === pickedRow) ?? (canner ? tables[canner.method]?.[0] : undefined) ?? rows[0] ?? null;
  return { rows, row, canner, setRow, setCanner };
}

export type PlanChoice = ReturnType<typeof usePlanChoice>;
