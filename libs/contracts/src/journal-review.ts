import { type DaySummary, ENTRY_KINDS, type EntryKind, type Lane, STATION_PATTERN } from '@jarday/live';
import { z } from 'zod';
import type { DaySummaryView } from './days.js';
import { idSchema } from './kitchens.js';
import type { JournalEvent } from './live.js';

/** The journal's filters: every one given must match. Unknown fields are refused like everywhere else. */
export const journalQuerySchema = z.strictObject({
  station: z
    .string()
    .regex(STATION_PATTERN, 'A station is day, prep, stove, jars, cooling, other or canner:<id>')
    .optional(),
  loadId: idSchema.optional(),
  kind: z.enum(ENTRY_KINDS, { error: `A kind is one of: ${ENTRY_KINDS.join(', ')}` }).optional(),
});
export type JournalQuery = z.input<typeof journalQuerySchema>;

/** `?limit=`: how many past days the list shows, newest first. */
export const pastDaysQuerySchema = z.strictObject({
  limit: z.coerce.number().int().min(1).max(100).default(20),
});

/** One journal entry, placed and told in plain words. */
export interface JournalEntryView extends JournalEvent {
  kind: EntryKind;
  station: string;
  stationLabel: string;
  loadId: string | null;
  loadNumber: number | null;
  /** What happened, in plain words. */
  text: string;
}

export interface JournalView {
  day: DaySummaryView;
  /** Every station and load of the day, for the filter chips, whatever the filter. */
  stations: { key: string; label: string }[];
  loads: { id: string; number: number; label: string }[];
  /** How many entries the day has in all, and the ones that match the filter, oldest first. */
  total: number;
  entries: JournalEntryView[];
}

/** The day's summary and its timeline picture. Times are epoch ms (server time). */
export interface DayReviewView {
  day: DaySummaryView;
  summary: DaySummary;
  lanes: Lane[];
  /** Where the picture ends: now for an open day, the close for a closed one. */
  until: number;
}

/** A past day in the list, with the figures that tell it apart. */
export interface PastDayView extends DaySummaryView {
  loadsProcessed: number;
  jarsProcessed: number;
  jarsBySize: { jarSize: string; jars: number }[];
  seals: { checked: number; sealed: number; rate: number | null };
  overrides: number;
}

/** "Yesterday's day": the kitchen's most recent closed day, or null before any day was closed. */
export interface YesterdayView {
  day: PastDayView | null;
}
