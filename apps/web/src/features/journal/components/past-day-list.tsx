import type { PastDayView } from '@jarday/contracts';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { jarSizeLabel, percent } from '../utils/journal-words';

/** "14 jars (7 quart, 7 pint) · 2 of 2 loads · seals 93%". */
export function pastDayFigures(d: PastDayView): string {
  const sizes = d.jarsBySize.map((s) => `${s.jars} ${jarSizeLabel(s.jarSize).toLowerCase()}`).join(', ');
  const jars = `${d.jarsProcessed} jar${d.jarsProcessed === 1 ? '' : 's'}${sizes ? ` (${sizes})` : ''}`;
  const seals = d.seals.checked === 0 ? 'seals not checked yet' : `seal rate ${percent(d.seals.rate)}`;
  return `${d.loadsProcessed} of ${d.loadCount} load${d.loadCount === 1 ? '' : 's'} processed · ${jars} · ${seals}`;
}

/** Past days, newest first, each with its figures and a way to its journal and plan. */
export function PastDayList({
  days,
  journalHref,
  planHref,
}: {
  days: readonly PastDayView[];
  journalHref: (d: PastDayView) => string;
  planHref: (d: PastDayView) => string;
}) {
  if (days.length === 0) return <Typography>No day has been closed yet.</Typography>;
  return (
    <Stack spacing={2}>
      {days.map((d) => (
        <Card key={d.id}>
          <CardContent>
            <Stack spacing={1.5}>
              <Stack spacing={0.25}>
                <Typography variant="h3" component="h3">
                  {d.title}
                </Typography>
                <Typography sx={{ color: 'text.secondary' }}>{d.date}</Typography>
                <Typography>{pastDayFigures(d)}</Typography>
                {d.overrides > 0 ? (
                  <Typography sx={{ color: 'warning.main', fontWeight: 700 }}>
                    {d.overrides} safety override{d.overrides === 1 ? '' : 's'}
                  </Typography>
                ) : null}
              </Stack>
              <Stack direction="row" sx={{ gap: 1, flexWrap: 'wrap' }}>
                <Button
                  component={RouterLink}
                  to={journalHref(d)}
                  variant="contained"
                  aria-label={`Journal: ${d.title}`}
                >
                  Journal
                </Button>
                <Button component={RouterLink} to={planHref(d)} variant="outlined" aria-label={`Day plan: ${d.title}`}>
                  Plan
                </Button>
              </Stack>
            </Stack>
          </CardContent>
        </Card>
      ))}
    </Stack>
  );
}
