import type { EntryKind, LanePhase } from '@jarday/live';
import { JAR_SIZE_LABELS, type JarSize } from '@jarday/rules';

/** "14:05" in this device's time. */
export const clockTime = (epochMs: number) =>
  new Date(epochMs).toLocaleTimeString(undefined, { hour: '2-digit', minute: '2-digit' });

/** "14:05:32", for entries a few seconds apart. */
export const clockSeconds = (epochMs: number) =>
  new Date(epochMs).toLocaleTimeString(undefined, { hour: '2-digit', minute: '2-digit', second: '2-digit' });

/** "Half-pint" for a known size; the raw word otherwise (a journal may outlive a size's name). */
export const jarSizeLabel = (size: string) => JAR_SIZE_LABELS[size as JarSize] ?? size;

/** "83%", or a dash before any jar was checked. */
export const percent = (rate: number | null) => (rate === null ? '–' : `${Math.round(rate * 100)}%`);

export const KIND_LABELS: Record<EntryKind, string> = {
  day: 'Day',
  batch: 'Batches',
  load: 'Loads',
  step: 'Steps',
  timer: 'Timers',
  alarm: 'Alarms',
  override: 'Overrides',
  other: 'Other',
};

/** The timeline's phases: their names and colours (Jarday's greens and apricots; alarms in the warning hue). */
export const PHASE_LOOK: Record<LanePhase, { label: string; color: string }> = {
  filling: { label: 'Filling', color: '#B8CFC9' },
  'coming-up': { label: 'Coming up to a boil', color: '#E8A466' },
  processing: { label: 'Processing', color: '#1F5F5B' },
  venting: { label: 'Venting', color: '#C9B38F' },
  'cooling-down': { label: 'Cooling down', color: '#8FB5C9' },
  'opening-wait': { label: 'Wait before opening', color: '#A9A0C9' },
  alarm: { label: 'Alarm ringing', color: '#B3261E' },
  rest: { label: 'Rest in the canner', color: '#4E8B86' },
  cooling: { label: 'On the cooling shelf', color: '#7FA7D1' },
  running: { label: 'Timer running', color: '#C8702A' },
};
