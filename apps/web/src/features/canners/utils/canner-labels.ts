import { JAR_SIZE_LABELS, JAR_SIZES, type CanningMethod, type GaugeType, type JarSize } from '@jarday/rules';

export const METHOD_LABELS: Record<CanningMethod, string> = {
  'boiling-water': 'Boiling-water canner',
  pressure: 'Pressure canner',
};

export const GAUGE_LABELS: Record<GaugeType, string> = {
  weighted: 'Weighted gauge',
  dial: 'Dial gauge',
};

/** "7 quarts · 9 pints", in jar-size order. */
export function formatCapacity(capacity: Partial<Record<JarSize, number>>): string {
  return JAR_SIZES.filter((size) => capacity[size] !== undefined)
    .map((size) => `${capacity[size]} × ${JAR_SIZE_LABELS[size].toLowerCase()}`)
    .join(' · ');
}
