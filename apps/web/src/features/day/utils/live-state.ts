import {
  daySnapshotSchema,
  journalEventSchema,
  timerJournalPayloadSchema,
  type DaySnapshot,
  type JournalEvent,
  type StepMark,
  type Timer,
} from '@jarday/contracts';

/** What a device knows of a live day: timers and step ticks, as of the last journal number it applied. */
export interface LiveDayData {
  dayId: string | null;
  /** The last `seq` applied; 0 before the first snapshot. */
  seq: number;
  timers: Record<string, Timer>;
  /** The step guide's ticks, keyed by `markKey`. */
  marks: Record<string, StepMark>;
}

export const emptyDay = (dayId: string | null = null): LiveDayData => ({ dayId, seq: 0, timers: {}, marks: {} });

/** One tick per batch or load and step. */
export const markKey = (m: Pick<StepMark, 'subject' | 'subjectId' | 'step'>) => `${m.subject}:${m.subjectId}:${m.step}`;

const stepMarkSchema = daySnapshotSchema.shape.steps.element;

/** Keeps the later of two ticks for the same step (an untick after a tick wins, and the other way round). */
export function mergeMark(marks: Record<string, StepMark>, mark: StepMark): Record<string, StepMark> {
  const key = markKey(mark);
  const known = marks[key];
  if (known && known.at > mark.at) return marks;
  return { ...marks, [key]: mark };
}

/**
 * What became of one event: applied in order; a duplicate (already seen, or older than the snapshot); a gap (the
 * device missed at least one, so it must join again with `sinceSeq`); another day's; or not a valid event at all.
 */
export type ReceiveOutcome = 'applied' | 'duplicate' | 'gap' | 'other-day' | 'invalid';

/** Keeps the newer of two copies of a timer: changes only ever raise `version`. */
export function mergeTimer(timers: Record<string, Timer>, timer: Timer): Record<string, Timer> {
  const known = timers[timer.id];
  if (known && known.version > timer.version) return timers;
  return { ...timers, [timer.id]: timer };
}

/** A snapshot replaces the picture wholesale: it is the server's truth as of its `seq`. */
export function applySnapshot(data: LiveDayData, snapshot: DaySnapshot): LiveDayData {
  if (data.dayId === snapshot.dayId && snapshot.seq < data.seq) return data;
  const timers: Record<string, Timer> = {};
  for (const t of snapshot.timers) timers[t.id] = t;
  const marks: Record<string, StepMark> = {};
  for (const m of snapshot.steps ?? []) marks[markKey(m)] = m;
  return { dayId: snapshot.dayId, seq: snapshot.seq, timers, marks };
}

/** The timer a journal entry carries (every `timer.*` and `alarm.*` entry does), or null. */
export function timerOf(event: JournalEvent): Timer | null {
  if (!event.type.startsWith('timer.') && !event.type.startsWith('alarm.')) return null;
  const payload = timerJournalPayloadSchema.safeParse(event.payload);
  return payload.success ? payload.data.timer : null;
}

/** The tick a `step.confirmed` or `step.undone` entry carries, or null. */
export function markOf(event: JournalEvent): StepMark | null {
  if (event.type !== 'step.confirmed' && event.type !== 'step.undone') return null;
  const mark = stepMarkSchema.safeParse((event.payload as { mark?: unknown } | null)?.mark);
  return mark.success ? mark.data : null;
}

/**
 * Applies one broadcast entry in `seq` order: the next number is applied, an old one ignored, a number beyond the
 * next one reported as a gap and left unapplied (the re-join's snapshot will cover it).
 */
export function receiveEvent(data: LiveDayData, raw: unknown): { data: LiveDayData; outcome: ReceiveOutcome } {
  const parsed = journalEventSchema.safeParse(raw);
  if (!parsed.success) return { data, outcome: 'invalid' };
  const event = parsed.data as JournalEvent;
  if (event.dayId !== data.dayId) return { data, outcome: 'other-day' };
  if (event.seq <= data.seq) return { data, outcome: 'duplicate' };
  if (event.seq > data.seq + 1) return { data, outcome: 'gap' };
  const timer = timerOf(event);
  const mark = markOf(event);
  return {
    data: {
      ...data,
      seq: event.seq,
      timers: timer ? mergeTimer(data.timers, timer) : data.timers,
      marks: mark ? mergeMark(data.marks, mark) : data.marks,
    },
    outcome: 'applied',
  };
}

/** True for entries that change what REST's DayView holds (batches, loads, the day's status), not the timers. */
export const changesDayView = (event: Pick<JournalEvent, 'type'>) =>
  event.type.startsWith('load.') || event.type.startsWith('batch.') || event.type.startsWith('day.');
