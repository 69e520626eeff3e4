import type { DayPlanView } from '@jarday/contracts';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Chip from '@mui/material/Chip';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { clock, comeUpText, dayAndClock, jarCount } from '../utils/planner-labels';

function BigTime({ label, time, note }: { label: string; time: string; note?: string }) {
  return (
    <Card sx={{ flex: 1 }}>
      <CardContent>
        <Typography variant="subtitle1" component="p">
          {label}
        </Typography>
        <Typography component="p" sx={{ fontSize: '2.5rem', fontWeight: 700, lineHeight: 1.1 }}>
          {time}
        </Typography>
        {note ? <Typography variant="body2">{note}</Typography> : null}
      </CardContent>
    </Card>
  );
}

/** The day at a glance: when the water goes on, the last lift, the bands, jars by size, come-ups and loads. */
export function PlanSummary({ plan }: { plan: DayPlanView }) {
  const altitude = `${plan.altitude.value.toLocaleString('en-US')} ${plan.altitude.unit}`;
  return (
    <Stack spacing={3}>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
        <BigTime label="Start heating the canner water" time={clock(plan.heatingStartAt)} />
        <BigTime label="Last load lifted" time={clock(plan.endAt)} />
        <BigTime
          label="Bands may come off"
          time={dayAndClock(plan.bandsOff.earliestAt)}
          note={`12 h after the last lift; 24 h recommended (${dayAndClock(plan.bandsOff.recommendedAt)})`}
        />
      </Stack>

      <Stack component="section" spacing={1} aria-labelledby="plan-jars">
        <Typography id="plan-jars" variant="h3" component="h3">
          Jars to get ready
        </Typography>
        <Stack direction="row" sx={{ flexWrap: 'wrap', gap: 1 }}>
          {plan.jarsBySize.map((j) => (
            <Chip key={j.jarSize} label={jarCount(j.jars, j.jarSize)} sx={{ fontSize: '1.125rem', height: 44 }} />
          ))}
        </Stack>
        {plan.batches
          .filter((b) => b.partialJar > 0)
          .map((b) => (
            <Typography key={b.index} variant="body2">
              {b.recipeName}: the last jar will be part-filled; refrigerate it rather than process it.
            </Typography>
          ))}
      </Stack>

      <Stack component="section" spacing={1} aria-labelledby="plan-come-up">
        <Typography id="plan-come-up" variant="h3" component="h3">
          Come-up (lid on to rolling boil)
        </Typography>
        {plan.canners.map((c) => (
          <Typography key={c.id}>
            <strong>{c.name}</strong>: {comeUpText(c.comeUp)}
          </Typography>
        ))}
      </Stack>

      <Stack component="section" spacing={1.5} aria-labelledby="plan-loads">
        <Typography id="plan-loads" variant="h3" component="h3">
          Canner loads
        </Typography>
        <Stack component="ol" spacing={1.5} sx={{ listStyle: 'none', p: 0, m: 0 }}>
          {plan.loads.map((l) => (
            <Card component="li" key={l.number} variant="outlined">
              <CardContent>
                <Typography variant="h4" component="p">
                  Load {l.number} · {l.cannerName} · {jarCount(l.jars, l.plan.jarSize)}
                </Typography>
                <Typography>
                  {l.plan.recipeName}: <strong>{l.plan.minutes} min</strong>
                  {l.plan.pressure ? ` at ${l.plan.pressure.pounds} lb (${l.plan.pressure.gauge} gauge)` : ''} at{' '}
                  {altitude} ({l.plan.band.label} band)
                </Typography>
                <Typography variant="body2">
                  Lid on {clock(l.lidOnAt)} · timing from {clock(l.processStartAt)} · lift {clock(l.liftAt)} · bands
                  from {dayAndClock(l.bandsOff.earliestAt)}
                </Typography>
              </CardContent>
            </Card>
          ))}
        </Stack>
      </Stack>
    </Stack>
  );
}
