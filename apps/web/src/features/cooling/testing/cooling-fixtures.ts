// Invented loads on a cooling shelf. Their band and reprocess times come from the real rules (@jarday/rules), so
// the tests see exactly the times the server would send.
import type { CoolingDayView, CoolingLoadView, SealCheckView } from '@jarday/contracts';
import { bandRemovalTimes, reprocessDeadline } from '@jarday/rules';
import type { CoolingShelf } from '../api/get-cooling-shelf';

export const KITCHEN_ID = '5f3c2b1a-7d6e-4c8b-9a0f-1e2d3c4b5a69';
export const DAY_ID = '6f1c2a4e-8d3b-4c5a-9e7f-1a2b3c4d5e6f';
export const LOAD_ID = 'c3d4e5f6-a7b8-4c9d-8e0f-112233445566';
const HOUR_MS = 3600_000;

export function coolingLoad(liftedHoursAgo: number, over: Partial<CoolingLoadView> = {}): CoolingLoadView {
  const lifted = new Date(Date.now() - liftedHoursAgo * HOUR_MS);
  const { earliestAt, recommendedAt } = bandRemovalTimes(lifted);
  return {
    loadId: LOAD_ID,
    dayId: DAY_ID,
    dayDate: '2025-09-06',
    number: 2,
    recipeName: 'Hot-packed jam',
    jarSize: 'half-pint',
    jars: 6,
    method: 'boiling-water',
    cannerName: 'Speckled canner',
    liftedAt: lifted.toISOString(),
    bandsEarliestAt: earliestAt.toISOString(),
    bandsRecommendedAt: recommendedAt.toISOString(),
    reprocessDeadline: reprocessDeadline(lifted).toISOString(),
    bandsOffAt: null,
    bandsOffOverride: null,
    reprocessOf: null,
    reprocessedBy: null,
    sealChecks: [],
    lot: null,
    ...over,
  };
}

export const sealCheck = (over: Partial<SealCheckView> = {}): SealCheckView => ({
  jarNumber: 1,
  result: 'sealed',
  outcome: 'store',
  checkedAt: new Date().toISOString(),
  byName: 'Ada Fenwick',
  ...over,
});

export const coolingDay = (over: Partial<CoolingDayView> = {}): CoolingDayView => ({
  dayId: DAY_ID,
  date: '2025-09-06',
  title: 'Apricot jam',
  status: 'closed',
  sealRate: { checked: 0, sealed: 0, rate: null },
  ...over,
});

export const shelfOf = (loads: CoolingLoadView[], days = [coolingDay()]): CoolingShelf => ({
  serverTime: new Date().toISOString(),
  offsetMs: 0,
  loads,
  days,
});

export const loadPathOf = (loadId = LOAD_ID) => `/api/kitchens/${KITCHEN_ID}/loads/${loadId}`;
