import type {
  bandsOffSchema,
  CoolingDayView,
  CoolingLoadView,
  CoolingShelfView,
  JournalEvent,
  SealRate,
} from '@jarday/contracts';
import { bandGate, formatRemaining, reprocessWindow } from '@jarday/rules';
import { Injectable } from '@nestjs/common';
import type { z } from 'zod';
import { AppError, forbidden, notFound } from '../common/app-error.js';
import type { BatchRow, DayRow, LoadRow } from '../days/days.repository.js';
import { DaysRepository } from '../days/days.repository.js';
import { type Actor, DaysService } from '../days/days.service.js';
import { PantryService } from '../pantry/pantry.service.js';
import { LivePublisher } from '../realtime/live-publisher.js';
import { type SealCheckRow, CoolingRepository, type ShelfRow } from './cooling.repository.js';
import { sealRateOf, toCoolingLoadView } from './cooling-views.js';

/** Finished loads stay on the shelf this long after lifting, so yesterday's results are still at hand. */
export const RECENT_SHELF_DAYS = 3;
const DAY_MS = 24 * 3600_000;

export interface ShelfLoad {
  load: LoadRow;
  day: DayRow;
  batch: BatchRow;
}

export const notLifted = (load: LoadRow) =>
  new AppError('not_lifted', `Load ${load.number} has not been lifted out of the canner yet`);

/** "ran out 2 h 5 min ago: refrigerate them", the refusal for a reprocess past its 24 hours. */
export const reprocessClosed = (load: LoadRow, now: Date) => {
  const lateMs = now.getTime() - reprocessWindow(load.liftedAt!, now).deadline.getTime();
  const when = lateMs < 60_000 ? 'have just run out' : `ran out ${formatRemaining(lateMs)} ago`;
  return new AppError(
    'reprocess_closed',
    `The 24 hours to reprocess load ${load.number} ${when}: refrigerate its unsealed jars and eat them within a few days.`,
  );
};

/**
 * The cooling shelf and the band gate: 12 h after lifting, 24 h better, earlier only on a lead's written reason
 * (USDA Complete Guide to Home Canning, Guide 1: cool undisturbed 12 to 24 hours). Works on a closed day too: the
 * bands come off tomorrow.
 */
@Injectable()
export class CoolingService {
  constructor(
    private readonly cooling: CoolingRepository,
    private readonly days: DaysRepository,
    private readonly daysService: DaysService,
    private readonly pantry: PantryService,
    private readonly publisher: LivePublisher,
  ) {}

  /** With a day: every lifted load of it. Without: loads not finished, and any lifted in the last 3 days. */
  shelf(kitchenId: string, dayId: string | undefined, now = new Date()): CoolingShelfView {
    const asked = dayId ? this.daysService.requireDay(kitchenId, dayId) : undefined;
    const rows = asked
      ? this.cooling.shelfOfDay(asked.id)
      : this.cooling.shelf(kitchenId, new Date(now.getTime() - RECENT_SHELF_DAYS * DAY_MS));
    const dayRows = new Map<string, DayRow>(asked ? [[asked.id, asked]] : []);
    for (const r of rows) dayRows.set(r.day.id, r.day);
    const counts = this.cooling.sealCounts([...dayRows.keys()]);
    const days: CoolingDayView[] = [...dayRows.values()]
      .sort((a, b) => b.date.localeCompare(a.date) || b.createdAt.getTime() - a.createdAt.getTime())
      .map((d) => ({
        dayId: d.id,
        date: d.date,
        title: d.title,
        status: d.status,
        sealRate: sealRateOf(counts.get(d.id)),
      }));
    return { serverTime: now.toISOString(), loads: this.views(rows), days };
  }

  /** Checked jars of the day against those that sealed; a reprocessed jar counts once per time it was processed. */
  sealRate(dayId: string): SealRate {
    return sealRateOf(this.cooling.sealCounts([dayId]).get(dayId));
  }

  loadView(kitchenId: string, loadId: string): CoolingLoadView {
    const { load, day, batch } = this.requireLoad(kitchenId, loadId);
    if (!load.liftedAt) throw notLifted(load);
    return this.views([{ load, day, recipeName: batch.recipe.name, jarSize: batch.jarSize }])[0]!;
  }

  /**
   * Bands off a lifted load. From 12 h after lifting anyone but a watcher may; before, only a lead with a written
   * reason. A refusal is journalled too, so the day's record shows who tried to disturb the jars early.
   */
  bandsOff(
    kitchenId: string,
    loadId: string,
    input: z.output<typeof bandsOffSchema>,
    actor: Actor,
    now = new Date(),
  ): CoolingLoadView {
    const { load, day } = this.requireLoad(kitchenId, loadId);
    if (!load.liftedAt) throw notLifted(load);
    // A second tap (or a second device) finds the bands off already: same answer, nothing new in the journal.
    if (load.bandsOffAt) return this.loadView(kitchenId, loadId);
    const gate = bandGate(load.liftedAt, now);
    const base = { loadId: load.id, number: load.number, liftedAt: load.liftedAt.toISOString() };
    if (!gate.allowed) {
      const leadOverride = input.override && actor.role === 'lead';
      if (!leadOverride) {
        const reason = input.override ? 'override-needs-lead' : 'too-early';
        this.publish(() => [
          this.daysService.record(day.id, actor, now, 'load.bands-refused', {
            ...base,
            reason,
            remainingMs: gate.remainingMs,
            earliestAt: gate.earliestAt.toISOString(),
            message: gate.message,
            ...(input.override ? { overrideReason: input.override.reason } : {}),
          }),
        ]);
        if (input.override) {
          throw forbidden(`Only a lead may take bands off before 12 hours. ${gate.message}`);
        }
        throw new AppError('bands_too_early', gate.message);
      }
    }
    const override = gate.allowed ? null : input.override!.reason;
    this.publish(() => {
      if (!this.cooling.setBandsOff(load.id, now, actor.userId, override)) return [];
      return [
        this.daysService.record(day.id, actor, now, 'load.bands-off', {
          ...base,
          bandsOffAt: now.toISOString(),
          early: !gate.allowed,
          override,
          ...(gate.allowed ? {} : { remainingMs: gate.remainingMs }),
        }),
      ];
    });
    return this.loadView(kitchenId, loadId);
  }

  requireLoad(kitchenId: string, loadId: string): ShelfLoad {
    const found = this.cooling.findLoad(kitchenId, loadId);
    if (!found) throw notFound('Load');
    return found;
  }

  private views(rows: ShelfRow[]): CoolingLoadView[] {
    const ids = rows.map((r) => r.load.id);
    const checks = new Map<string, SealCheckRow[]>();
    for (const c of this.cooling.checksOf(ids)) checks.set(c.loadId, [...(checks.get(c.loadId) ?? []), c]);
    const carried = this.cooling.reprocessingOf(ids);
    const lots = this.pantry.lotRefs([...new Set(rows.map((r) => r.load.batchId))]);
    return rows.map((r) =>
      toCoolingLoadView(r, checks.get(r.load.id) ?? [], carried.get(r.load.id), lots.get(r.load.batchId)),
    );
  }

  /** Runs the change and its journal entries in one transaction, then tells the day's devices. */
  publish(change: () => JournalEvent[]): void {
    this.publisher.publish(this.days.transaction(change));
  }
}
