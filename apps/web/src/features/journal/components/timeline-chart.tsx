import type { Lane } from '@jarday/live';
import Box from '@mui/material/Box';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { BarChart } from '@mui/x-charts/BarChart';
import { useMemo } from 'react';
import { clockTime, PHASE_LOOK } from '../utils/journal-words';
import { phasesShown, timelineSeries } from '../utils/timeline-series';

const LANE_PX = 52;

/**
 * The day as a picture: a lane per station and per load, each stretch coloured by what was happening. Drawn with
 * MUI X Charts as horizontal stacked bars whose transparent offsets leave the gaps between stretches.
 */
export function TimelineChart({ lanes, start, until }: { lanes: readonly Lane[]; start: number; until: number }) {
  const series = useMemo(() => timelineSeries(lanes, start), [lanes, start]);
  const shown = phasesShown(lanes);
  const span = Math.max(1, (until - start) / 60_000);
  if (lanes.length === 0) return <Typography>Nothing to draw yet: no timer has run on this day.</Typography>;
  return (
    <Stack component="figure" spacing={1.5} sx={{ m: 0 }} aria-labelledby="timeline-caption">
      <Typography id="timeline-caption" component="figcaption" variant="body2" sx={{ color: 'text.secondary' }}>
        From {clockTime(start)} to {clockTime(until)}: {lanes.filter((l) => l.kind === 'station').length} stations and{' '}
        {lanes.filter((l) => l.kind === 'load').length} loads.
      </Typography>
      {/* On a phone the picture keeps a readable width and scrolls sideways. */}
      <Box sx={{ width: '100%', overflowX: 'auto' }} data-testid="timeline-chart">
        <Box sx={{ minWidth: 640 }}>
          <BarChart
            height={LANE_PX * lanes.length + 70}
            layout="horizontal"
            series={series}
            yAxis={[
              {
                scaleType: 'band',
                data: lanes.map((l) => l.label),
                width: 170,
                categoryGapRatio: 0.3,
                tickLabelStyle: { fontSize: 15 },
              },
            ]}
            xAxis={[
              {
                min: 0,
                max: span,
                tickNumber: 6,
                tickLabelStyle: { fontSize: 14 },
                valueFormatter: (minutes: number) => clockTime(start + minutes * 60_000),
              },
            ]}
            hideLegend
            grid={{ vertical: true }}
            slotProps={{ tooltip: { trigger: 'item' } }}
            margin={{ left: 8, right: 48, top: 8, bottom: 8 }}
          />
        </Box>
      </Box>
      <Stack
        component="ul"
        direction="row"
        sx={{ flexWrap: 'wrap', gap: 2, listStyle: 'none', p: 0, m: 0 }}
        aria-label="What the colours mean"
      >
        {shown.map((phase) => (
          <Stack component="li" key={phase} direction="row" spacing={1} sx={{ alignItems: 'center' }}>
            <Box sx={{ width: 22, height: 22, borderRadius: 1, bgcolor: PHASE_LOOK[phase].color }} aria-hidden />
            <Typography variant="body2">{PHASE_LOOK[phase].label}</Typography>
          </Stack>
        ))}
      </Stack>
    </Stack>
  );
}
