import type { BatchView, LoadView } from '@jarday/contracts';
import { JAR_SIZE_LABELS } from '@jarday/rules';

/** "6 half-pint jars", "1 quart jar". */
export function jarsText(count: number, jarSize: BatchView['jarSize']): string {
  return `${count} ${JAR_SIZE_LABELS[jarSize].toLowerCase()} jar${count === 1 ? '' : 's'}`;
}

/** "Load 2 · Hot-packed jam · 6 half-pint jars". */
export function loadTitle(load: LoadView, batch: BatchView | undefined): string {
  const what = batch ? ` · ${batch.recipeName} · ${jarsText(load.jars, batch.jarSize)}` : ` · ${load.jars} jars`;
  return `Load ${load.number}${what}`;
}

/** What a process timer is for: "Hot-packed jam: 10 min at 2,350 ft (1,001–6,000 ft band)". */
export function processFor(load: LoadView): string {
  const { plan } = load;
  const pressure = plan.pressure ? ` at ${plan.pressure.pounds} lb (${plan.pressure.gauge} gauge)` : '';
  return `${plan.recipeName}: ${plan.minutes} min${pressure} at ${plan.altitudeFt.toLocaleString('en-US')} ft (${plan.band.label} band)`;
}

/** A time of day on this device: "14:05". */
export const clockTime = (epochMs: number) =>
  new Date(epochMs).toLocaleTimeString(undefined, { hour: '2-digit', minute: '2-digit' });
