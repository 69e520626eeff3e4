import { randomUUID } from 'node:crypto';
import type {
  CautionView,
  createLotEntrySchema,
  LotEntryAnswer,
  LotEntryView,
  LotView,
  PantrySummaryView,
  updateLotSchema,
} from '@jarday/contracts';
import { bestQualityDate, CAUTIONS, JAR_SIZES, type JarSize, SPOILAGE_SOURCE } from '@jarday/rules';
import { Injectable } from '@nestjs/common';
import type { z } from 'zod';
import { AppError, notFound } from '../common/app-error.js';
import { type BatchRow, type DayRow, DaysRepository } from '../days/days.repository.js';
import { newPublicToken, lotCode } from './lot-code.js';
import { type LotEntryRow, type LotListRow, PantryRepository, type LotRow } from './pantry.repository.js';

/** Who writes in the pantry book. */
export interface PantryActor {
  userId: string;
  name: string;
}

const spoiledCaution = CAUTIONS['spoiled-lot'];
/** What a flagged lot's answers carry, so no screen shows a spoilage report without it. */
export const SPOILAGE_CAUTION: CautionView = {
  id: spoiledCaution.id,
  title: spoiledCaution.title,
  text: spoiledCaution.text,
  source: spoiledCaution.source ?? SPOILAGE_SOURCE,
};

const toEntryView = (e: LotEntryRow): LotEntryView => ({
  id: e.id,
  kind: e.kind,
  jars: e.jars,
  recipient: e.recipient,
  date: e.date,
  note: e.note,
  byName: e.byName,
  createdAt: e.createdAt.toISOString(),
});

const toLotView = (r: LotListRow, entries: LotEntryRow[]): LotView => ({
  id: r.lot.id,
  kitchenId: r.lot.kitchenId,
  dayId: r.lot.dayId,
  dayDate: r.dayDate,
  batchId: r.lot.batchId,
  code: r.lot.code,
  recipeName: r.recipeName,
  jarSize: r.jarSize,
  location: r.lot.location,
  bestBy: r.lot.bestBy,
  flaggedAt: r.lot.flaggedAt?.toISOString() ?? null,
  sealed: r.sealed,
  eaten: r.eaten,
  given: r.given,
  spoiled: r.spoiled,
  onShelf: onShelf(r),
  entries: entries.map(toEntryView),
});

/** Never below zero: a seal check corrected after jars were taken must not show a negative shelf. */
const onShelf = (r: LotListRow) => Math.max(0, r.sealed - r.eaten - r.given - r.spoiled);

/**
 * The pantry: one lot per batch, made with the batch's first seal check, and the book of what left the shelf.
 * Sealed jars come from the seal checks, so the pantry can never hold more jars than sealed.
 */
@Injectable()
export class PantryService {
  constructor(
    private readonly pantry: PantryRepository,
    private readonly days: DaysRepository,
  ) {}

  /**
   * The batch's lot, made now if this is its first seal check; call inside the seal check's transaction. The code
   * is the day's date and the batch's letter in the day (260815-B); a second day on the same date gets a suffix.
   */
  ensureLotInTransaction(day: DayRow, batch: BatchRow, now: Date): { lot: LotRow; created: boolean } {
    const existing = this.pantry.findLotOfBatch(batch.id);
    if (existing) return { lot: existing, created: false };
    const index = this.days.listBatches(day.id).findIndex((b) => b.id === batch.id);
    const base = lotCode(day.date, Math.max(0, index));
    let code = base;
    for (let n = 2; this.pantry.codeTaken(day.kitchenId, code); n += 1) code = `${base}-${n}`;
    const lot: LotRow = {
      id: randomUUID(),
      kitchenId: day.kitchenId,
      dayId: day.id,
      batchId: batch.id,
      code,
      publicToken: newPublicToken(),
      location: null,
      bestBy: bestQualityDate(day.date),
      flaggedAt: null,
      createdAt: now,
    };
    this.pantry.insertLot(lot);
    return { lot, created: true };
  }

  /** Lot id and code by batch, for the cooling shelf. */
  lotRefs(batchIds: string[]): Map<string, { id: string; code: string }> {
    return new Map(this.pantry.lotsOfBatches(batchIds).map((l) => [l.batchId, { id: l.id, code: l.code }]));
  }

  list(kitchenId: string, dayId?: string): LotView[] {
    const rows = this.pantry.list(kitchenId, dayId);
    const entries = new Map<string, LotEntryRow[]>();
    for (const e of this.pantry.entriesOf(rows.map((r) => r.lot.id))) {
      entries.set(e.lotId, [...(entries.get(e.lotId) ?? []), e]);
    }
    return rows.map((r) => toLotView(r, entries.get(r.lot.id) ?? []));
  }

  get(kitchenId: string, lotId: string): LotView {
    const row = this.requireLot(kitchenId, lotId);
    return toLotView(row, this.pantry.entriesOf([lotId]));
  }

  /** Jars on the shelf by size across every lot; sizes without jars on the shelf are left out. */
  summary(kitchenId: string): PantrySummaryView {
    const rows = this.pantry.list(kitchenId, undefined);
    const bySize = new Map<JarSize, { onShelf: number; lots: number }>();
    for (const r of rows) {
      const jars = onShelf(r);
      if (jars === 0) continue;
      const size = bySize.get(r.jarSize) ?? { onShelf: 0, lots: 0 };
      bySize.set(r.jarSize, { onShelf: size.onShelf + jars, lots: size.lots + 1 });
    }
    const sizes = JAR_SIZES.filter((s) => bySize.has(s)).map((jarSize) => ({ jarSize, ...bySize.get(jarSize)! }));
    return {
      bySize: sizes,
      onShelf: sizes.reduce((n, s) => n + s.onShelf, 0),
      lots: rows.length,
      flaggedLots: rows.filter((r) => r.lot.flaggedAt !== null).length,
    };
  }

  update(kitchenId: string, lotId: string, input: z.output<typeof updateLotSchema>): LotView {
    this.requireLot(kitchenId, lotId);
    this.pantry.setLocation(lotId, input.location === '' ? null : input.location);
    return this.get(kitchenId, lotId);
  }

  /**
   * Jars eaten, given away or reported spoiled leave the shelf; more than are on it is refused. A spoilage report
   * flags the lot, so every other jar of it gets a look, and the answer carries the botulism caution.
   */
  addEntry(
    kitchenId: string,
    lotId: string,
    input: z.output<typeof createLotEntrySchema>,
    actor: PantryActor,
    now = new Date(),
  ): LotEntryAnswer {
    const entry = this.pantry.transaction(() => {
      const lot = this.requireLot(kitchenId, lotId);
      if (input.date < lot.dayDate) {
        throw new AppError('validation_failed', `The jars were canned on ${lot.dayDate}: give that date or later`, [
          { path: 'date', message: `On or after ${lot.dayDate}` },
        ]);
      }
      const left = onShelf(lot);
      if (input.jars > left) {
        throw new AppError(
          'not_enough_jars',
          `Lot ${lot.lot.code} has ${left} jar${left === 1 ? '' : 's'} on the shelf, not ${input.jars}`,
        );
      }
      const row: LotEntryRow = {
        id: randomUUID(),
        lotId,
        kind: input.kind,
        jars: input.jars,
        recipient: input.kind === 'gift' ? (input.recipient ?? null) : null,
        date: input.date,
        note: input.note || null,
        byUserId: actor.userId,
        byName: actor.name,
        createdAt: now,
      };
      this.pantry.insertEntry(row);
      if (input.kind === 'spoiled') this.pantry.flag(lotId, now);
      return row;
    });
    const lot = this.get(kitchenId, lotId);
    return { lot, entry: toEntryView(entry), caution: lot.flaggedAt ? SPOILAGE_CAUTION : null };
  }

  private requireLot(kitchenId: string, lotId: string): LotListRow {
    const row = this.pantry.find(kitchenId, lotId);
    if (!row) throw notFound('Lot');
    return row;
  }
}
