import { describe, expect, it } from 'vitest';
import { journalFixtures, T0 } from '../testing/journal-fixtures';
import { PHASE_LOOK } from './journal-words';
import { phasesShown, timelineSeries } from './timeline-series';

describe('timelineSeries', () => {
  it('stacks a transparent gap then a coloured stretch per slot, so each bar starts where its stretch starts', () => {
    const { lanes } = journalFixtures().review;
    const series = timelineSeries(lanes, T0);
    const laneIndex = lanes.findIndex((l) => l.kind === 'load');
    const load = lanes[laneIndex]!;
    let position = 0;
    load.segments.forEach((s, k) => {
      const gap = series.find((x) => x.id === `gap-${k}`)!;
      const stretch = series.find((x) => x.id === `stretch-${k}`)!;
      expect(gap.color).toBe('transparent');
      position += gap.data[laneIndex]!;
      expect(position).toBeCloseTo((s.start - T0) / 60_000, 6);
      position += stretch.data[laneIndex]!;
      expect(position).toBeCloseTo((s.end - T0) / 60_000, 6);
      expect(stretch.colorGetter?.({ dataIndex: laneIndex })).toBe(PHASE_LOOK[s.phase].color);
      expect(gap.valueFormatter(1, { dataIndex: laneIndex })).toBeNull();
      expect(stretch.valueFormatter(1, { dataIndex: laneIndex })).toContain(PHASE_LOOK[s.phase].label);
    });
    expect(series.every((s) => s.stack === 'lanes' && s.data.length === lanes.length)).toBe(true);
  });

  it('names in the legend only the phases the day had', () => {
    const { lanes } = journalFixtures().review;
    expect(phasesShown(lanes)).toEqual(['filling', 'coming-up', 'processing', 'alarm', 'rest']);
  });
});
