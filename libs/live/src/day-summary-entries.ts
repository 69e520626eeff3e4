import type { AlarmReason, Timer, TimerKind } from './timer.js';

/**
 * One journal entry as the server stores and sends it. Declared here by shape (the contracts build on this library,
 * not the other way round); `at` is the ISO time the server gives, or epoch ms.
 */
export interface JournalEntryLike {
  seq: number;
  at: string | number;
  actor: { userId: string; name: string } | null;
  deviceId: string | null;
  type: string;
  payload: unknown;
}

/** What kind of thing an entry records, for the journal's filters. */
export const ENTRY_KINDS = ['day', 'batch', 'load', 'step', 'timer', 'alarm', 'override', 'other'] as const;
export type EntryKind = (typeof ENTRY_KINDS)[number];

/** Where in the kitchen it happened: the board's stations, one per canner (`canner:<id>`), and the day itself. */
export const FIXED_STATIONS = ['day', 'prep', 'stove', 'jars', 'cooling', 'other'] as const;
export type FixedStation = (typeof FIXED_STATIONS)[number];
export type StationKey = FixedStation | `canner:${string}`;
export const STATION_PATTERN = /^(day|prep|stove|jars|cooling|other|canner:[A-Za-z0-9-]{1,64})$/;

const STATION_LABELS: Record<FixedStation, string> = {
  day: 'The day',
  prep: 'Prep',
  stove: 'Stove',
  jars: 'Jars',
  cooling: 'Cooling shelf',
  other: 'Other timers',
};

const STATION_OF_KIND: Partial<Record<TimerKind, FixedStation>> = {
  blanch: 'prep',
  simmer: 'stove',
  'hot-hold': 'jars',
  'cooling-rest': 'cooling',
  custom: 'other',
};
const STATION_OF_BATCH_STEP: Record<string, FixedStation> = {
  blanch: 'prep',
  peel: 'prep',
  simmer: 'stove',
  'warm-jars': 'jars',
};

/** A load as the `load.*` entries carry it. */
export interface LoadFacts {
  id: string;
  number: number;
  cannerId: string | null;
  cannerName: string;
  jars: number;
  plan: { recipeName: string; jarSize: string; minutes: number };
  liftedAt: string | null;
}

/** An entry placed: its station, load and kind, and the time as epoch ms. */
export interface PlacedEntry<E extends JournalEntryLike = JournalEntryLike> {
  entry: E;
  atMs: number;
  kind: EntryKind;
  station: StationKey;
  stationLabel: string;
  loadId: string | null;
  loadNumber: number | null;
  /** The timer the entry is about, as it stood after the change. */
  timer: Timer | null;
}

export const atMs = (at: string | number): number => (typeof at === 'number' ? at : Date.parse(at));

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null;
/** The load an entry's payload carries, if it carries one. */
export function loadOf(payload: unknown): LoadFacts | null {
  if (!isObject(payload) || !isObject(payload.load)) return null;
  const load = payload.load as unknown as LoadFacts;
  return typeof load.id === 'string' && typeof load.number === 'number' ? load : null;
}
export function timerOf(payload: unknown): Timer | null {
  if (!isObject(payload) || !isObject(payload.timer)) return null;
  return typeof payload.timer.id === 'string' ? (payload.timer as unknown as Timer) : null;
}
export function alarmReasonOf(payload: unknown): AlarmReason | null {
  if (!isObject(payload) || !isObject(payload.detail)) return null;
  return (payload.detail.alarmReason as AlarmReason | undefined) ?? null;
}
function markOf(payload: unknown): { subject: string; subjectId: string; step: string } | null {
  if (!isObject(payload) || !isObject(payload.mark)) return null;
  return payload.mark as { subject: string; subjectId: string; step: string };
}

function kindOf(type: string): EntryKind {
  if (type === 'timer.override') return 'override';
  const prefix = type.split('.')[0] ?? '';
  return (ENTRY_KINDS as readonly string[]).includes(prefix) ? (prefix as EntryKind) : 'other';
}

/**
 * Places every entry of a day (in seq order) at its station and load. The day's loads come from its own
 * `load.created` entries, so the record reads the same however the kitchen's canners change later. An entry that
 * names a load no entry created (a later kind of entry, say) still gets its load id and the cooling shelf.
 */
export function placeEntries<E extends JournalEntryLike>(entries: readonly E[]): PlacedEntry<E>[] {
  const loads = new Map<string, LoadFacts>();
  for (const e of entries) {
    const load = loadOf(e.payload);
    if (load) loads.set(load.id, { ...loads.get(load.id), ...load });
  }
  const cannerStation = (load: LoadFacts | undefined): [StationKey, string] =>
    load?.cannerId ? [`canner:${load.cannerId}`, load.cannerName] : ['other', STATION_LABELS.other];

  return [...entries]
    .sort((a, b) => a.seq - b.seq)
    .map((entry) => {
      const kind = kindOf(entry.type);
      const timer = timerOf(entry.payload);
      const mark = markOf(entry.payload);
      const payloadLoad = loadOf(entry.payload);
      const payloadLoadId =
        isObject(entry.payload) && typeof entry.payload.loadId === 'string' ? entry.payload.loadId : null;
      const loadId =
        timer?.loadId ?? payloadLoad?.id ?? (mark?.subject === 'load' ? mark.subjectId : null) ?? payloadLoadId;
      const load = loadId ? loads.get(loadId) : undefined;
      let station: [StationKey, string];
      if (timer) {
        const fixed = STATION_OF_KIND[timer.kind];
        station = fixed ? [fixed, STATION_LABELS[fixed]] : cannerStation(load);
      } else if (mark?.subject === 'batch') {
        const fixed = STATION_OF_BATCH_STEP[mark.step] ?? 'day';
        station = [fixed, STATION_LABELS[fixed]];
      } else if (mark?.step === 'cooling-shelf') {
        station = ['cooling', STATION_LABELS.cooling];
      } else if (kind === 'load' || mark) {
        station = cannerStation(load);
      } else if (loadId) {
        station = ['cooling', STATION_LABELS.cooling];
      } else {
        station = ['day', STATION_LABELS.day];
      }
      return {
        entry,
        atMs: atMs(entry.at),
        kind,
        station: station[0],
        stationLabel: station[1],
        loadId: loadId ?? null,
        loadNumber: load?.number ?? null,
        timer,
      };
    });
}

/** The journal's filters; every one given must match. */
export interface EntryFilter {
  station?: string;
  loadId?: string;
  kind?: EntryKind;
}
export function filterEntries<E extends JournalEntryLike>(placed: readonly PlacedEntry<E>[], f: EntryFilter) {
  return placed.filter(
    (p) =>
      (f.station === undefined || p.station === f.station) &&
      (f.loadId === undefined || p.loadId === f.loadId) &&
      (f.kind === undefined || p.kind === f.kind),
  );
}

/** The stations and loads a day's entries mention, in order of first appearance (loads by number). */
export function dayFacets(placed: readonly PlacedEntry[]) {
  const stations = new Map<string, string>();
  const loads = new Map<string, LoadFacts>();
  for (const p of placed) {
    stations.set(p.station, p.stationLabel);
    const load = loadOf(p.entry.payload);
    if (load) loads.set(load.id, load);
  }
  return {
    stations: [...stations].map(([key, label]) => ({ key, label })),
    loads: [...loads.values()].sort((a, b) => a.number - b.number),
  };
}
