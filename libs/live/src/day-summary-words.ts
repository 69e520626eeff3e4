import { alarmReasonOf, type JournalEntryLike, loadOf, timerOf } from './day-summary-entries.js';
import { formatDuration } from './format.js';
import type { AlarmReason } from './timer.js';

const ALARM_WORDS: Record<AlarmReason, string> = {
  done: 'time is up',
  vented: 'vented 10 minutes: close the vent',
  'may-open': 'the lid may come off',
};

const TIMER_WORDS: Record<string, string> = {
  'timer.created': 'Timer set',
  'timer.started': 'Timer started',
  'timer.paused': 'Paused',
  'timer.resumed': 'Resumed',
  'timer.time-added': 'Time added',
  'timer.duration-set': 'Time changed',
  'timer.override': 'Safety override',
  'timer.cancelled': 'Cancelled',
  'timer.heating': 'Water heating, lid on',
  'timer.boil-confirmed': 'Full rolling boil confirmed: the process time counts from now',
  'timer.boil-lost': 'Boil lost: the full time starts again at the next rolling boil',
  'timer.venting': 'Venting started',
  'timer.vented': 'Vented 10 minutes: coming up to pressure',
  'timer.at-pressure': 'At pressure: the process time counts from now',
  'timer.pressure-lost': 'Pressure lost: the full time starts again at pressure',
  'timer.done': 'Time reached',
  'timer.heat-off': 'Heat off',
  'timer.gauge-zero': 'Gauge at zero',
  'timer.finished': 'Lid may come off',
};

const STEP_WORDS: Record<string, string> = {
  blanch: 'blanched',
  peel: 'peeled',
  simmer: 'simmered',
  'warm-jars': 'jars warmed',
  fill: 'jars filled',
  headspace: 'headspace checked',
  'free-bubbles': 'bubbles freed',
  'wipe-rims': 'rims wiped',
  'lids-bands': 'lids and bands on',
  'water-over-jars': 'water over the jars',
  'wait-for-boil': 'waiting for the boil',
  process: 'processed',
  'heat-off-lid-off': 'heat off, lid off',
  rest: 'rested in the canner',
  'lift-jars': 'jars lifted out',
  'cooling-shelf': 'on the cooling shelf',
};

const text = (v: unknown): string | undefined => (typeof v === 'string' ? v : undefined);
const obj = (v: unknown): Record<string, unknown> =>
  typeof v === 'object' && v !== null ? (v as Record<string, unknown>) : {};

/** A journal entry in plain words, for the journal list, the CSV's detail column and the printed record. */
export function describeEntry(entry: JournalEntryLike, loadNumbers?: ReadonlyMap<string, number>): string {
  const p = obj(entry.payload);
  const load = loadOf(entry.payload);
  const timer = timerOf(entry.payload);
  switch (entry.type) {
    case 'day.opened':
      return `Day opened: ${text(p.title) ?? ''} (${text(p.date) ?? ''})`;
    case 'day.closed':
      return 'Day closed';
    case 'batch.added': {
      const b = obj(p.batch);
      return `Batch added: ${text(b.recipeName) ?? 'a recipe'}, ${typeof b.jars === 'number' ? b.jars : '?'} ${text(b.jarSize) ?? ''} jars (${text(b.pack) ?? ''} pack)`;
    }
    case 'load.created':
      return load
        ? `Load ${load.number} made: ${load.jars} ${load.plan.jarSize} jars of ${load.plan.recipeName} in ${load.cannerName}, ${load.plan.minutes} min`
        : 'Load made';
    case 'load.lifted':
      return load ? `Load ${load.number} lifted out upright onto the cooling shelf` : 'Load lifted out';
    case 'step.confirmed':
    case 'step.undone': {
      const mark = obj(p.mark);
      const step = text(mark.step) ?? '';
      const subjectId = text(mark.subjectId);
      const number = subjectId ? loadNumbers?.get(subjectId) : undefined;
      const whose = mark.subject === 'load' ? (number ? `Load ${number}` : 'A load') : 'A batch';
      const words = STEP_WORDS[step] ?? step;
      return entry.type === 'step.confirmed' ? `${whose}: ${words}` : `${whose}: "${words}" unticked`;
    }
  }
  if (timer) {
    const detail = obj(p.detail);
    if (entry.type === 'alarm.raised') {
      const reason = alarmReasonOf(entry.payload);
      return `Alarm: ${timer.label}: ${reason ? ALARM_WORDS[reason] : 'alarm'}`;
    }
    if (entry.type === 'alarm.acknowledged') return `Alarm answered: ${timer.label}`;
    if (entry.type === 'timer.override') {
      const span =
        typeof detail.durationMs === 'number' && typeof detail.minimumMs === 'number'
          ? ` (${formatDuration(detail.durationMs)} instead of at least ${formatDuration(detail.minimumMs)})`
          : '';
      return `Safety override: ${timer.label}${span}. Reason: ${text(detail.reason) ?? ''}`;
    }
    const words = TIMER_WORDS[entry.type] ?? entry.type;
    const late =
      typeof detail.lateByMs === 'number' && detail.lateByMs >= 1000 ? `, ${formatDuration(detail.lateByMs)} late` : '';
    const length =
      entry.type === 'timer.created' || entry.type === 'timer.duration-set'
        ? ` (${formatDuration(timer.durationMs)})`
        : '';
    return `${timer.label}: ${words}${length}${late}`;
  }
  return entry.type;
}
