import type { Lane, LaneSegment } from '@jarday/live';
import { clockTime, PHASE_LOOK } from './journal-words';

const TRANSPARENT = 'transparent';

export interface TimelineSeries {
  id: string;
  data: number[];
  stack: 'lanes';
  color: string;
  colorGetter?: (d: { dataIndex: number }) => string;
  valueFormatter: (value: number | null, ctx: { dataIndex: number }) => string | null;
}

/**
 * Lanes as stacked horizontal bars: for the k-th stretch of every lane a transparent bar covers the gap since the
 * previous stretch, then a coloured bar its length, in minutes from `start`. Each stretch takes its phase's colour.
 */
export function timelineSeries(lanes: readonly Lane[], start: number): TimelineSeries[] {
  const slots = Math.max(0, ...lanes.map((l) => l.segments.length));
  const series: TimelineSeries[] = [];
  const minutes = (ms: number) => ms / 60_000;
  for (let k = 0; k < slots; k += 1) {
    const seg = (i: number): LaneSegment | undefined => lanes[i]?.segments[k];
    series.push({
      id: `gap-${k}`,
      stack: 'lanes',
      color: TRANSPARENT,
      data: lanes.map((lane) => {
        const s = lane.segments[k];
        if (!s) return 0;
        const before = k === 0 ? start : lane.segments[k - 1]!.end;
        return minutes(s.start - before);
      }),
      // The gaps are not part of the picture's meaning: no tooltip line for them.
      valueFormatter: () => null,
    });
    series.push({
      id: `stretch-${k}`,
      stack: 'lanes',
      color: PHASE_LOOK.processing.color,
      colorGetter: ({ dataIndex }) => {
        const s = seg(dataIndex);
        return s ? PHASE_LOOK[s.phase].color : TRANSPARENT;
      },
      data: lanes.map((lane) => {
        const s = lane.segments[k];
        return s ? minutes(s.end - s.start) : 0;
      }),
      valueFormatter: (_v, { dataIndex }) => {
        const s = seg(dataIndex);
        if (!s) return null;
        return `${s.label}: ${PHASE_LOOK[s.phase].label}, ${clockTime(s.start)}–${clockTime(s.end)}${s.open ? ' (still going)' : ''}`;
      },
    });
  }
  return series;
}

/** The phases the picture shows, for its legend. */
export function phasesShown(lanes: readonly Lane[]) {
  const seen = new Set(lanes.flatMap((l) => l.segments.map((s) => s.phase)));
  return (Object.keys(PHASE_LOOK) as (keyof typeof PHASE_LOOK)[]).filter((p) => seen.has(p));
}
