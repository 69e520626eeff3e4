import { type DaySummary, formatDuration } from '@jarday/live';
import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Grid from '@mui/material/Grid';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';
import { clockTime, jarSizeLabel, percent } from '../utils/journal-words';

function Figure({ title, value, children }: { title: string; value: string; children?: ReactNode }) {
  return (
    <Card sx={{ height: '100%' }}>
      <CardContent>
        <Typography variant="body2" component="h3" sx={{ color: 'text.secondary' }}>
          {title}
        </Typography>
        <Typography sx={{ fontSize: '2.25rem', fontWeight: 700, lineHeight: 1.2 }}>{value}</Typography>
        {children}
      </CardContent>
    </Card>
  );
}

/** The day's figures in big type, every alarm's ring time, and every safety override in the warning colour. */
export function DaySummaryCards({ summary }: { summary: DaySummary }) {
  const { seals } = summary;
  return (
    <Stack spacing={2}>
      <Grid container spacing={2}>
        <Grid size={{ xs: 6, md: 3 }}>
          <Figure title="Loads processed" value={`${summary.loadsProcessed} of ${summary.loads.length}`}>
            <Typography variant="body2">
              {summary.boilLosses === 0
                ? 'No boil lost'
                : `Boil lost ${summary.boilLosses} time${summary.boilLosses === 1 ? '' : 's'}`}
            </Typography>
          </Figure>
        </Grid>
        <Grid size={{ xs: 6, md: 3 }}>
          <Figure title="Jars processed" value={String(summary.jarsProcessed)}>
            <Typography variant="body2">
              {summary.jarsBySize.map((s) => `${s.jars} ${jarSizeLabel(s.jarSize).toLowerCase()}`).join(', ') ||
                'None yet'}
            </Typography>
          </Figure>
        </Grid>
        <Grid size={{ xs: 6, md: 3 }}>
          <Figure title="Seal rate" value={percent(seals.rate)}>
            <Typography variant="body2">
              {seals.checked === 0 ? 'Seals not checked yet' : `${seals.sealed} of ${seals.checked} jars sealed`}
            </Typography>
          </Figure>
        </Grid>
        <Grid size={{ xs: 6, md: 3 }}>
          <Figure title="Alarms" value={String(summary.alarms.length)}>
            <Typography variant="body2">
              {summary.longestRingMs === null
                ? 'None answered'
                : `Longest ring ${formatDuration(summary.longestRingMs)}, average ${formatDuration(summary.averageRingMs ?? 0)}`}
            </Typography>
          </Figure>
        </Grid>
      </Grid>
      <Stack component="section" spacing={1.5} aria-labelledby="overrides-heading">
        <Typography id="overrides-heading" variant="h3" component="h3">
          Safety overrides ({summary.overrides.length})
        </Typography>
        {summary.overrides.length === 0 ? (
          <Typography>No safety gate was overridden on this day.</Typography>
        ) : (
          summary.overrides.map((o) => (
            <Alert key={`${o.at}-${o.what}`} severity="warning" variant="outlined" sx={{ borderWidth: 2 }}>
              <AlertTitle sx={{ fontWeight: 700 }}>{o.what}</AlertTitle>
              <Typography>Reason: {o.reason}</Typography>
              <Typography variant="body2">
                {o.byName} at {clockTime(o.at)}
              </Typography>
            </Alert>
          ))
        )}
      </Stack>
    </Stack>
  );
}

/** Every alarm of the day and how long it rang before someone answered it (answer time - raised time). */
export function AlarmRings({ summary }: { summary: DaySummary }) {
  if (summary.alarms.length === 0) return null;
  return (
    <Stack component="section" spacing={1} aria-labelledby="alarms-heading">
      <Typography id="alarms-heading" variant="h2">
        How long each alarm rang
      </Typography>
      <Stack component="ul" spacing={0.5} sx={{ m: 0, pl: 3 }}>
        {summary.alarms.map((a) => (
          <Typography component="li" key={`${a.timerId}-${a.raisedAt}`}>
            {clockTime(a.raisedAt)} {a.label}:{' '}
            {a.ringMs === null ? (
              <strong>not answered</strong>
            ) : (
              <>
                rang <strong>{formatDuration(a.ringMs)}</strong>, answered by {a.acknowledgedBy ?? 'someone'}
              </>
            )}
          </Typography>
        ))}
      </Stack>
    </Stack>
  );
}
