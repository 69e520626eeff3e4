import type { CoolingLoadView, SealCheckView, SealRate } from '@jarday/contracts';
import { bandRemovalTimes, reprocessDeadline } from '@jarday/rules';
import type { LoadRow } from '../days/days.repository.js';
import type { SealCheckRow, ShelfRow } from './cooling.repository.js';

export const toSealCheckView = (c: SealCheckRow): SealCheckView => ({
  jarNumber: c.jarNumber,
  result: c.result,
  outcome: c.outcome,
  checkedAt: c.checkedAt.toISOString(),
  byName: c.byName,
});

/** sealed / checked; null before the first check rather than a misleading 0 %. */
export const sealRateOf = (counts: { checked: number; sealed: number } | undefined): SealRate => {
  const checked = counts?.checked ?? 0;
  const sealed = counts?.sealed ?? 0;
  return { checked, sealed, rate: checked === 0 ? null : sealed / checked };
};

/** A lifted load with the times the rules count from its lifting: bands at 12 h (24 h better), reprocess by 24 h. */
export function toCoolingLoadView(
  row: ShelfRow,
  checks: SealCheckRow[],
  reprocessedBy: LoadRow | undefined,
  lot: { id: string; code: string } | undefined,
): CoolingLoadView {
  const { load, day } = row;
  const liftedAt = load.liftedAt!;
  const { earliestAt, recommendedAt } = bandRemovalTimes(liftedAt);
  return {
    loadId: load.id,
    dayId: day.id,
    dayDate: day.date,
    number: load.number,
    recipeName: row.recipeName,
    jarSize: row.jarSize,
    jars: load.jars,
    method: load.method,
    cannerName: load.cannerName,
    liftedAt: liftedAt.toISOString(),
    bandsEarliestAt: earliestAt.toISOString(),
    bandsRecommendedAt: recommendedAt.toISOString(),
    reprocessDeadline: reprocessDeadline(liftedAt).toISOString(),
    bandsOffAt: load.bandsOffAt?.toISOString() ?? null,
    bandsOffOverride: load.bandsOffOverride,
    reprocessOf: load.reprocessOf,
    reprocessedBy: reprocessedBy?.id ?? null,
    sealChecks: checks.map(toSealCheckView),
    lot: lot ?? null,
  };
}
