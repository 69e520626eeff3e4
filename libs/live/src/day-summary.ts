import {
  alarmReasonOf,
  type JournalEntryLike,
  loadOf,
  type LoadFacts,
  type PlacedEntry,
  placeEntries,
} from './day-summary-entries.js';
import type { AlarmReason } from './timer.js';

export * from './day-summary-entries.js';
export { timelineLanes, type Lane, type LaneSegment, type LanePhase, LANE_PHASES } from './day-summary-lanes.js';
export { describeEntry } from './day-summary-words.js';

/** One alarm of the day: when it was raised, and who silenced it how much later (ack time - raised time). */
export interface AlarmRing {
  timerId: string;
  label: string;
  loadNumber: number | null;
  reason: AlarmReason | null;
  raisedAt: number;
  acknowledgedAt: number | null;
  acknowledgedBy: string | null;
  ringMs: number | null;
}

/** A safety gate someone with the lead's role stepped past, with their written reason. */
export interface OverrideNote {
  seq: number | null;
  at: number;
  byName: string;
  reason: string;
  /** What was overridden, in words: "Load 3: rest in the open canner: 2 min instead of at least 5 min". */
  what: string;
  loadNumber: number | null;
}

export interface LoadSummary {
  loadId: string;
  number: number;
  recipeName: string;
  jarSize: string;
  jars: number;
  cannerName: string;
  minutes: number;
  /** Lid on (boiling water) or venting started (pressure), epoch ms. */
  heatingAt: number | null;
  /** The first full rolling boil (or first time at pressure). */
  firstBoilAt: number | null;
  /** Lid on to the first rolling boil: the canner's come-up for this load. */
  comeUpMs: number | null;
  boilLosses: number;
  /** The moment the load had its full process time. */
  processedAt: number | null;
  liftedAt: number | null;
}

/** The seal checks of the day's jars, as the cooling shelf recorded them. */
export interface SealTally {
  checked: number;
  sealed: number;
  /** sealed / checked, or null before any check. */
  rate: number | null;
}

export interface DaySummary {
  entryCount: number;
  firstAt: number | null;
  lastAt: number | null;
  loads: LoadSummary[];
  loadsProcessed: number;
  /** Jars of the processed loads, by jar size, largest count first. */
  jarsBySize: { jarSize: string; jars: number; loads: number }[];
  jarsProcessed: number;
  boilLosses: number;
  seals: SealTally;
  alarms: AlarmRing[];
  alarmsUnanswered: number;
  longestRingMs: number | null;
  averageRingMs: number | null;
  overrides: OverrideNote[];
}

export interface SummaryExtras {
  /** One result per checked jar ('sealed', 'unsealed', 'broken'). */
  sealResults?: readonly string[];
  /** Overrides recorded outside the journal (bands taken off early, say), already in words. */
  otherOverrides?: readonly OverrideNote[];
}

const minutes = (ms: number) => `${Math.round(ms / 60_000)} min`;

function loadSummaries(placed: readonly PlacedEntry[]): LoadSummary[] {
  const loads = new Map<string, LoadSummary>();
  const ensure = (l: LoadFacts): LoadSummary => {
    const known = loads.get(l.id);
    const next: LoadSummary = known ?? {
      loadId: l.id,
      number: l.number,
      recipeName: l.plan.recipeName,
      jarSize: l.plan.jarSize,
      jars: l.jars,
      cannerName: l.cannerName,
      minutes: l.plan.minutes,
      heatingAt: null,
      firstBoilAt: null,
      comeUpMs: null,
      boilLosses: 0,
      processedAt: null,
      liftedAt: null,
    };
    if (l.liftedAt) next.liftedAt = Date.parse(l.liftedAt);
    loads.set(l.id, next);
    return next;
  };
  for (const p of placed) {
    const load = loadOf(p.entry.payload);
    if (load) ensure(load);
    const timer = p.timer;
    if (!timer?.loadId || (timer.kind !== 'process' && timer.kind !== 'pressure-process')) continue;
    const s = loads.get(timer.loadId);
    if (!s) continue;
    const type = p.entry.type;
    if ((type === 'timer.heating' || type === 'timer.venting') && s.heatingAt === null) s.heatingAt = p.atMs;
    if ((type === 'timer.boil-confirmed' || type === 'timer.at-pressure') && s.firstBoilAt === null) {
      s.firstBoilAt = p.atMs;
      if (s.heatingAt !== null) s.comeUpMs = p.atMs - s.heatingAt;
    }
    if (type === 'timer.boil-lost' || type === 'timer.pressure-lost') s.boilLosses += 1;
    if (type === 'timer.done') s.processedAt = timer.doneAt ?? p.atMs;
  }
  return [...loads.values()].sort((a, b) => a.number - b.number);
}

function alarmRings(placed: readonly PlacedEntry[]): AlarmRing[] {
  const open = new Map<string, AlarmRing>();
  const rings: AlarmRing[] = [];
  for (const p of placed) {
    if (!p.timer) continue;
    if (p.entry.type === 'alarm.raised') {
      const ring: AlarmRing = {
        timerId: p.timer.id,
        label: p.timer.label,
        loadNumber: p.loadNumber,
        reason: alarmReasonOf(p.entry.payload) ?? p.timer.alarm?.reason ?? null,
        raisedAt: p.atMs,
        acknowledgedAt: null,
        acknowledgedBy: null,
        ringMs: null,
      };
      open.set(p.timer.id, ring);
      rings.push(ring);
    } else if (p.entry.type === 'alarm.acknowledged') {
      const ring = open.get(p.timer.id);
      if (!ring) continue;
      ring.acknowledgedAt = p.atMs;
      ring.acknowledgedBy = p.entry.actor?.name ?? null;
      ring.ringMs = p.atMs - ring.raisedAt;
      open.delete(p.timer.id);
    }
  }
  return rings;
}

function overrideNotes(placed: readonly PlacedEntry[]): OverrideNote[] {
  return placed
    .filter((p) => p.entry.type === 'timer.override' && p.timer)
    .map((p) => {
      const detail = (p.entry.payload as { detail?: { reason?: string; durationMs?: number; minimumMs?: number } })
        .detail;
      const span =
        detail?.durationMs !== undefined && detail.minimumMs !== undefined
          ? `: ${minutes(detail.durationMs)} instead of at least ${minutes(detail.minimumMs)}`
          : '';
      return {
        seq: p.entry.seq,
        at: p.atMs,
        byName: p.entry.actor?.name ?? 'Jarday',
        reason: detail?.reason ?? '',
        what: `${p.timer!.label}${span}`,
        loadNumber: p.loadNumber,
      };
    });
}

/**
 * The day's summary from its journal entries (any order; seq decides): loads processed and their jars by size,
 * come-ups and boil losses, every alarm with how long it rang before someone acknowledged it (ack time - raised
 * time; null while unanswered), every safety override with its reason, and the seal rate of the checked jars.
 */
export function summariseDay(entries: readonly JournalEntryLike[], extras: SummaryExtras = {}): DaySummary {
  const placed = placeEntries(entries);
  const loads = loadSummaries(placed);
  const processed = loads.filter((l) => l.processedAt !== null);
  const bySize = new Map<string, { jarSize: string; jars: number; loads: number }>();
  for (const l of processed) {
    const row = bySize.get(l.jarSize) ?? { jarSize: l.jarSize, jars: 0, loads: 0 };
    row.jars += l.jars;
    row.loads += 1;
    bySize.set(l.jarSize, row);
  }
  const alarms = alarmRings(placed);
  const rang = alarms.flatMap((a) => (a.ringMs === null ? [] : [a.ringMs]));
  const results = extras.sealResults ?? [];
  const sealed = results.filter((r) => r === 'sealed').length;
  const overrides = [...overrideNotes(placed), ...(extras.otherOverrides ?? [])].sort((a, b) => a.at - b.at);
  return {
    entryCount: placed.length,
    firstAt: placed[0]?.atMs ?? null,
    lastAt: placed.at(-1)?.atMs ?? null,
    loads,
    loadsProcessed: processed.length,
    jarsBySize: [...bySize.values()].sort((a, b) => b.jars - a.jars || a.jarSize.localeCompare(b.jarSize)),
    jarsProcessed: processed.reduce((n, l) => n + l.jars, 0),
    boilLosses: loads.reduce((n, l) => n + l.boilLosses, 0),
    seals: { checked: results.length, sealed, rate: results.length > 0 ? sealed / results.length : null },
    alarms,
    alarmsUnanswered: alarms.filter((a) => a.acknowledgedAt === null).length,
    longestRingMs: rang.length > 0 ? Math.max(...rang) : null,
    averageRingMs: rang.length > 0 ? Math.round(rang.reduce((a, b) => a + b, 0) / rang.length) : null,
    overrides,
  };
}
