import type { DayPlanView, PlanStepView } from '@jarday/contracts';
import Box from '@mui/material/Box';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { clock, dayAndClock, laneOf, span, STATION_LABELS } from '../utils/planner-labels';

const KIND_COLOURS: Partial<Record<PlanStepView['kind'], string>> = {
  'heat-water': 'secondary.main',
  'come-up': 'secondary.light',
  process: 'primary.main',
  vent: 'primary.light',
  pressurize: 'primary.light',
  rest: 'primary.dark',
  'cool-down': 'primary.dark',
  fill: 'warning.main',
};

const LEGEND: { colour: string; label: string }[] = [
  { colour: 'secondary.main', label: 'Heating' },
  { colour: 'secondary.light', label: 'Come-up' },
  { colour: 'primary.main', label: 'Process' },
  { colour: 'primary.dark', label: 'Rest' },
  { colour: 'warning.main', label: 'Filling' },
  { colour: 'text.disabled', label: 'Prep and jars' },
];

function Legend() {
  return (
    <Stack direction="row" aria-hidden sx={{ flexWrap: 'wrap', columnGap: 2, rowGap: 0.5 }}>
      {LEGEND.map((l) => (
        <Stack key={l.label} direction="row" spacing={1} sx={{ alignItems: 'center' }}>
          <Box sx={{ width: 18, height: 18, borderRadius: 1, bgcolor: l.colour }} />
          <Typography variant="body2">{l.label}</Typography>
        </Stack>
      ))}
    </Stack>
  );
}

/** A lane per station and canner, each step a bar on the day's time axis. Drawn for the eye: the list is the text. */
function TimelineChart({ plan }: { plan: DayPlanView }) {
  const steps = plan.steps.filter((s) => s.kind !== 'bands-off' && s.endAt > s.startAt);
  const from = Math.min(...steps.map((s) => Date.parse(s.startAt)));
  const to = Math.max(...steps.map((s) => Date.parse(s.endAt)));
  const width = Math.max(1, to - from);
  const lanes = [...new Set(steps.map(laneOf))];
  const laneName = (lane: string) =>
    lane.startsWith('canner:')
      ? (plan.canners.find((c) => `canner:${c.id}` === lane)?.name ?? 'Canner')
      : STATION_LABELS[lane as keyof typeof STATION_LABELS];
  return (
    <Box aria-hidden sx={{ display: 'grid', gridTemplateColumns: 'minmax(80px, 140px) 1fr', rowGap: 1, columnGap: 2 }}>
      {lanes.map((lane) => (
        <Box key={lane} sx={{ display: 'contents' }}>
          <Typography variant="body2" sx={{ alignSelf: 'center', fontWeight: 500 }}>
            {laneName(lane)}
          </Typography>
          <Box sx={{ position: 'relative', height: 36, bgcolor: 'action.hover', borderRadius: 2 }}>
            {steps
              .filter((s) => laneOf(s) === lane)
              .map((s, i) => (
                <Box
                  key={i}
                  title={`${s.label} ${clock(s.startAt)}–${clock(s.endAt)}`}
                  sx={{
                    position: 'absolute',
                    top: 4,
                    bottom: 4,
                    left: `${((Date.parse(s.startAt) - from) / width) * 100}%`,
                    width: `max(3px, ${((Date.parse(s.endAt) - Date.parse(s.startAt)) / width) * 100}%)`,
                    bgcolor: KIND_COLOURS[s.kind] ?? 'text.disabled',
                    borderRadius: 1,
                    opacity: s.estimated ? 0.7 : 1,
                  }}
                />
              ))}
          </Box>
        </Box>
      ))}
      <span />
      <Stack direction="row" sx={{ justifyContent: 'space-between' }}>
        <Typography variant="body2">{clock(new Date(from).toISOString())}</Typography>
        <Typography variant="body2">{clock(new Date(to).toISOString())}</Typography>
      </Stack>
    </Box>
  );
}

/** The day's steps in time order, with clock times; allowances (not published times) are marked "about". */
export function PlanTimeline({ plan }: { plan: DayPlanView }) {
  return (
    <Stack component="section" spacing={2} aria-labelledby="plan-timeline">
      <Typography id="plan-timeline" variant="h3" component="h3">
        Timeline
      </Typography>
      <TimelineChart plan={plan} />
      <Legend />
      <Stack component="ol" aria-label="Steps of the day" sx={{ listStyle: 'none', p: 0, m: 0 }}>
        {plan.steps.map((s, i) => {
          const moment = s.startAt === s.endAt;
          const when = s.kind === 'bands-off' ? dayAndClock(s.startAt) : clock(s.startAt);
          return (
            <Stack
              component="li"
              key={i}
              direction="row"
              spacing={2}
              sx={{ py: 1.25, borderBottom: 1, borderColor: 'divider' }}
            >
              <Typography sx={{ minWidth: { xs: 64, sm: 120 }, fontWeight: 700, fontVariantNumeric: 'tabular-nums' }}>
                {when}
              </Typography>
              <Stack sx={{ flex: 1 }}>
                <Typography>
                  {s.label}
                  {moment ? '' : ` · ${s.estimated ? 'about ' : ''}${span(s.startAt, s.endAt)}`}
                </Typography>
                {s.detail ? (
                  <Typography variant="body2" sx={{ color: 'text.secondary' }}>
                    {s.detail}
                  </Typography>
                ) : null}
              </Stack>
            </Stack>
          );
        })}
      </Stack>
    </Stack>
  );
}
