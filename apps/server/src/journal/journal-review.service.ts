import type {
  DayReviewView,
  DaySummaryView,
  JournalEntryView,
  JournalEvent,
  JournalQuery,
  JournalView,
  PastDayView,
  YesterdayView,
} from '@jarday/contracts';
import {
  dayFacets,
  describeEntry,
  filterEntries,
  type OverrideNote,
  placeEntries,
  summariseDay,
  timelineLanes,
} from '@jarday/live';
import { Injectable } from '@nestjs/common';
import { notFound } from '../common/app-error.js';
import { dayRecordPdf } from './day-record-pdf.js';
import { journalCsv } from './journal-csv.js';
import { JournalReviewRepository } from './journal-review.repository.js';

/**
 * The Journal: a day's entries placed by station and load and told in plain words, its summary and timeline, and
 * the exports. Reads only; every figure comes from the journal and the seal checks as they were written.
 */
@Injectable()
export class JournalReviewService {
  constructor(private readonly repo: JournalReviewRepository) {}

  journal(kitchenId: string, dayId: string, query: JournalQuery): JournalView {
    const day = this.requireDay(kitchenId, dayId);
    const placed = this.placed(dayId);
    const facets = dayFacets(placed.map((p) => p.placed));
    const matching = new Set(
      filterEntries(
        placed.map((p) => p.placed),
        query,
      ).map((p) => p.entry.seq),
    );
    return {
      day,
      stations: facets.stations,
      loads: facets.loads.map((l) => ({ id: l.id, number: l.number, label: `Load ${l.number}: ${l.plan.recipeName}` })),
      total: placed.length,
      entries: placed.filter((p) => matching.has(p.view.seq)).map((p) => p.view),
    };
  }

  review(kitchenId: string, dayId: string, now = Date.now()): DayReviewView {
    const day = this.requireDay(kitchenId, dayId);
    const entries = this.repo.entries(dayId);
    const until = day.closedAt ? Date.parse(day.closedAt) : now;
    return {
      day,
      summary: summariseDay(entries, {
        sealResults: this.repo.sealResults(dayId),
        otherOverrides: this.bandOverrides(dayId),
      }),
      lanes: timelineLanes(entries, until),
      until,
    };
  }

  csv(kitchenId: string, dayId: string, query: JournalQuery): { name: string; body: string } {
    const view = this.journal(kitchenId, dayId, query);
    return { name: `jarday-${view.day.date}-journal.csv`, body: journalCsv(view.entries) };
  }

  async pdf(kitchenId: string, dayId: string): Promise<{ name: string; body: Buffer }> {
    const review = this.review(kitchenId, dayId);
    const entries = this.placed(dayId).map((p) => p.view);
    const body = await dayRecordPdf(review, entries, this.repo.kitchenName(kitchenId));
    return { name: `jarday-${review.day.date}-day-record.pdf`, body };
  }

  /** The kitchen's days, newest first, each with its figures. */
  pastDays(kitchenId: string, limit: number): PastDayView[] {
    return this.repo.listDays(kitchenId, limit).map((d) => this.withFigures(d));
  }

  /**
   * "Yesterday's day" is the kitchen's most recent CLOSED day (latest date, then latest close): the day just done,
   * whatever the calendar says, so a day closed after midnight or a weekend away still finds it.
   */
  yesterday(kitchenId: string): YesterdayView {
    const [day] = this.repo.listDays(kitchenId, 1, true);
    return { day: day ? this.withFigures(day) : null };
  }

  private withFigures(day: DaySummaryView): PastDayView {
    const s = summariseDay(this.repo.entries(day.id), {
      sealResults: this.repo.sealResults(day.id),
      otherOverrides: this.bandOverrides(day.id),
    });
    return {
      ...day,
      loadsProcessed: s.loadsProcessed,
      jarsProcessed: s.jarsProcessed,
      jarsBySize: s.jarsBySize.map(({ jarSize, jars }) => ({ jarSize, jars })),
      seals: s.seals,
      overrides: s.overrides.length,
    };
  }

  private placed(dayId: string) {
    const entries: JournalEvent[] = this.repo.entries(dayId);
    const placed = placeEntries(entries);
    const numbers = new Map(dayFacets(placed).loads.map((l) => [l.id, l.number]));
    return placed.map((p) => {
      const view: JournalEntryView = {
        ...p.entry,
        kind: p.kind,
        station: p.station,
        stationLabel: p.stationLabel,
        loadId: p.loadId,
        loadNumber: p.loadNumber,
        text: describeEntry(p.entry, numbers),
      };
      return { placed: p, view };
    });
  }

  private bandOverrides(dayId: string): OverrideNote[] {
    return this.repo.bandOverrides(dayId).map((b) => ({
      seq: null,
      at: b.at?.getTime() ?? 0,
      byName: b.byName ?? b.by ?? 'a lead',
      reason: b.reason ?? '',
      what: `Load ${b.number}: bands taken off before 12 hours`,
      loadNumber: b.number,
    }));
  }

  private requireDay(kitchenId: string, dayId: string): DaySummaryView {
    const day = this.repo.findDay(kitchenId, dayId);
    if (!day) throw notFound('Canning day');
    return day;
  }
}
