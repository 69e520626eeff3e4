import type { BatchView, DaySummaryView, LoadView } from '@jarday/contracts';
import type { BatchRow, DayRow, LoadRow } from './days.repository.js';

export const toBatchView = (b: BatchRow): BatchView => ({
  id: b.id,
  dayId: b.dayId,
  recipeId: b.recipeId,
  recipeName: b.recipe.name,
  tested: b.recipe.tested,
  jarSize: b.jarSize,
  pack: b.pack,
  jars: b.jars,
  createdAt: b.createdAt.toISOString(),
});

export const toLoadView = (l: LoadRow): LoadView => ({
  id: l.id,
  dayId: l.dayId,
  batchId: l.batchId,
  number: l.number,
  cannerId: l.cannerId,
  cannerName: l.cannerName,
  method: l.method,
  jars: l.jars,
  plan: l.plan,
  liftedAt: l.liftedAt?.toISOString() ?? null,
  createdAt: l.createdAt.toISOString(),
});

export const toSummary = (d: DayRow, counts: { batchCount: number; loadCount: number }): DaySummaryView => ({
  id: d.id,
  kitchenId: d.kitchenId,
  date: d.date,
  title: d.title,
  status: d.status,
  altitude: { value: d.altitudeValue, unit: d.altitudeUnit },
  createdAt: d.createdAt.toISOString(),
  closedAt: d.closedAt?.toISOString() ?? null,
  ...counts,
});
