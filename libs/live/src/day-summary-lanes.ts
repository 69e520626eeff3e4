import { type JournalEntryLike, loadOf, type PlacedEntry, placeEntries } from './day-summary-entries.js';

/** What a stretch of a lane shows. */
export const LANE_PHASES = [
  'filling',
  'coming-up',
  'processing',
  'venting',
  'cooling-down',
  'opening-wait',
  'alarm',
  'rest',
  'cooling',
  'running',
] as const;
export type LanePhase = (typeof LANE_PHASES)[number];

export interface LaneSegment {
  phase: LanePhase;
  start: number;
  end: number;
  /** Whose stretch it is: "Load 2", or the timer's label at a station. */
  label: string;
  /** Still going when the picture was drawn (it ends at `until`). */
  open: boolean;
}

export interface Lane {
  /** `station:<key>` or `load:<id>`. */
  id: string;
  kind: 'station' | 'load';
  label: string;
  /** In time order, never overlapping: a stretch that starts before the previous one ended starts at its end. */
  segments: LaneSegment[];
}

interface Raw extends LaneSegment {
  timerId: string | null;
  loadId: string | null;
  station: string;
  stationLabel: string;
}

/** The entry that begins a phase, and the entries that end whatever phase the timer is in. */
const BEGINS: Record<string, LanePhase> = {
  'timer.heating': 'coming-up',
  'timer.boil-lost': 'coming-up',
  'timer.boil-confirmed': 'processing',
  'timer.venting': 'venting',
  'timer.vented': 'coming-up',
  'timer.pressure-lost': 'coming-up',
  'timer.at-pressure': 'processing',
  'timer.heat-off': 'cooling-down',
  'timer.gauge-zero': 'opening-wait',
  'timer.started': 'running',
  'timer.resumed': 'running',
};
const ENDS = new Set(['timer.done', 'timer.finished', 'timer.cancelled', 'timer.paused']);
const KIND_PHASE: Record<string, LanePhase> = { 'canner-rest': 'rest', 'cooling-rest': 'cooling' };

function rawSegments(placed: readonly PlacedEntry[], until: number): Raw[] {
  const out: Raw[] = [];
  const current = new Map<string, Raw>();
  const alarms = new Map<string, Raw>();
  const filling = new Map<string, Raw>();
  const close = (map: Map<string, Raw>, id: string, at: number) => {
    const seg = map.get(id);
    if (seg) Object.assign(seg, { end: at, open: false });
    map.delete(id);
  };
  for (const p of placed) {
    const { entry, timer } = p;
    const load = loadOf(entry.payload);
    const base = { loadId: p.loadId, station: p.station, stationLabel: p.stationLabel, end: until, open: true };
    if (entry.type === 'load.created' && load) {
      const seg: Raw = {
        ...base,
        loadId: load.id,
        phase: 'filling',
        start: p.atMs,
        label: `Load ${load.number}`,
        timerId: null,
      };
      filling.set(load.id, seg);
      out.push(seg);
    }
    if (!timer) continue;
    const who = p.loadNumber !== null ? `Load ${p.loadNumber}` : timer.label;
    if (entry.type === 'alarm.raised') {
      const seg: Raw = { ...base, phase: 'alarm', start: p.atMs, label: who, timerId: timer.id };
      alarms.set(timer.id, seg);
      out.push(seg);
    }
    if (entry.type === 'alarm.acknowledged') close(alarms, timer.id, p.atMs);
    let begins = BEGINS[entry.type];
    if (begins === 'running') begins = KIND_PHASE[timer.kind] ?? 'running';
    if (ENDS.has(entry.type) || begins) close(current, timer.id, p.atMs);
    if (begins && timer.loadId) close(filling, timer.loadId, p.atMs);
    if (begins) {
      const seg: Raw = { ...base, phase: begins, start: p.atMs, label: who, timerId: timer.id };
      current.set(timer.id, seg);
      out.push(seg);
    }
  }
  return out;
}

/** Lays stretches one after the other on a lane: an overlap starts at the previous stretch's end. */
function lay(segments: readonly Raw[]): LaneSegment[] {
  const laid: LaneSegment[] = [];
  let end = -Infinity;
  for (const s of [...segments].sort((a, b) => a.start - b.start)) {
    const start = Math.max(s.start, end);
    if (s.end <= start) continue;
    laid.push({ phase: s.phase, start, end: s.end, label: s.label, open: s.open });
    end = s.end;
  }
  return laid;
}

/**
 * The day as a picture: a lane per station (each timer's stretches there) and a lane per load (filling, coming up,
 * processing, the alarm until someone answered it, the rest in the open canner, cooling). Stretches still going end
 * at `until` (default: the last entry's time). Stations in order of first use, then loads by number.
 */
export function timelineLanes(entries: readonly JournalEntryLike[], until?: number): Lane[] {
  const placed = placeEntries(entries);
  const end = until ?? placed.at(-1)?.atMs ?? 0;
  const raw = rawSegments(placed, end);
  const lanes: Lane[] = [];
  const stations = new Map<string, string>();
  for (const s of raw) if (s.phase !== 'filling') stations.set(s.station, s.stationLabel);
  for (const [key, label] of stations) {
    const mine = raw.filter((s) => s.station === key && s.phase !== 'filling');
    lanes.push({ id: `station:${key}`, kind: 'station', label, segments: lay(mine) });
  }
  const loads = new Map<string, number>();
  for (const p of placed) {
    const load = loadOf(p.entry.payload);
    if (load) loads.set(load.id, load.number);
  }
  for (const [loadId, number] of [...loads].sort((a, b) => a[1] - b[1])) {
    const mine = raw.filter((s) => s.loadId === loadId);
    lanes.push({ id: `load:${loadId}`, kind: 'load', label: `Load ${number}`, segments: lay(mine) });
  }
  return lanes;
}
