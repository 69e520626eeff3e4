import type { ComeUpView, PlanStepView, RecipeView } from '@jarday/contracts';
import { describeRow, JAR_SIZE_LABELS, type JarSize, type PackStyle } from '@jarday/rules';

/** The jar sizes and packs a recipe has a tested time for, by either method; only those can be planned. */
export function testedCombos(
  recipe: Pick<RecipeView, 'processing'>,
): { key: string; jarSize: JarSize; pack: PackStyle; label: string }[] {
  const rows = [...(recipe.processing.boilingWater?.rows ?? []), ...(recipe.processing.pressure?.rows ?? [])];
  const seen = new Map<string, { key: string; jarSize: JarSize; pack: PackStyle; label: string }>();
  for (const r of rows) {
    const key = `${r.jarSize}/${r.pack}`;
    if (!seen.has(key)) seen.set(key, { key, jarSize: r.jarSize, pack: r.pack, label: describeRow(r.jarSize, r.pack) });
  }
  return [...seen.values()];
}

/** "18 pint jars", "1 quart jar". */
export function jarCount(count: number, jarSize: JarSize): string {
  return `${count} ${JAR_SIZE_LABELS[jarSize].toLowerCase()} jar${count === 1 ? '' : 's'}`;
}

/** A time of day on this device, "08:40". */
export const clock = (iso: string) =>
  new Date(iso).toLocaleTimeString(undefined, { hour: '2-digit', minute: '2-digit' });

/** A time with its day, for the next day's band removal: "Sun 15 Aug, 23:20". */
export const dayAndClock = (iso: string) =>
  new Date(iso).toLocaleString(undefined, {
    weekday: 'short',
    day: 'numeric',
    month: 'short',
    hour: '2-digit',
    minute: '2-digit',
  });

/** Minutes between two instants, rounded: "45 min", "1 h 20 min". */
export function span(fromIso: string, toIso: string): string {
  const minutes = Math.round((Date.parse(toIso) - Date.parse(fromIso)) / 60_000);
  const h = Math.floor(minutes / 60);
  const m = minutes % 60;
  if (h === 0) return `${m} min`;
  return m === 0 ? `${h} h` : `${h} h ${m} min`;
}

/** The come-up in words, with where it came from. */
export function comeUpText(comeUp: ComeUpView): string {
  return `${Math.round(comeUp.minutes)} min · ${comeUp.detail}`;
}

/** Lanes of the timeline chart, in the order a kitchen reads them. */
export function laneOf(step: PlanStepView): string {
  return step.station === 'canner' ? `canner:${step.cannerId ?? ''}` : step.station;
}

export const STATION_LABELS: Record<Exclude<PlanStepView['station'], 'canner'>, string> = {
  prep: 'Prep',
  jars: 'Jars',
  fill: 'Filling',
};
