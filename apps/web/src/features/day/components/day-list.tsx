import type { DaySummaryView } from '@jarday/contracts';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { formatDate } from '../../../lib/labels';
import { dayPaths } from '../utils/day-paths';

function DayCard({ day }: { day: DaySummaryView }) {
  const open = day.status === 'open';
  return (
    <Card>
      <CardContent>
        <Stack spacing={1.5}>
          <Stack spacing={0.25}>
            <Typography variant="h3" component="h3">
              {day.title}
            </Typography>
            <Typography sx={{ color: 'text.secondary' }}>
              {formatDate(`${day.date}T12:00:00`)} · {day.batchCount} batch{day.batchCount === 1 ? '' : 'es'} ·{' '}
              {day.loadCount} load
              {day.loadCount === 1 ? '' : 's'}
              {open ? '' : ' · closed'}
            </Typography>
          </Stack>
          <Stack direction="row" sx={{ gap: 1, flexWrap: 'wrap' }}>
            {open ? (
              <Button
                component={RouterLink}
                to={dayPaths.board(day.kitchenId, day.id)}
                variant="contained"
                aria-label={`Counter board: ${day.title}`}
              >
                Counter board
              </Button>
            ) : null}
            {open ? (
              <Button
                component={RouterLink}
                to={dayPaths.pocket(day.kitchenId, day.id)}
                variant="outlined"
                aria-label={`Pocket view: ${day.title}`}
              >
                Pocket view
              </Button>
            ) : null}
            <Button
              component={RouterLink}
              to={dayPaths.plan(day.kitchenId, day.id)}
              variant="outlined"
              aria-label={`Day plan: ${day.title}`}
            >
              Plan
            </Button>
          </Stack>
        </Stack>
      </CardContent>
    </Card>
  );
}

/** The kitchen's open days first (to re-open a board), then the closed ones. */
export function DayList({ days }: { days: readonly DaySummaryView[] }) {
  const open = days.filter((d) => d.status === 'open');
  const closed = days.filter((d) => d.status === 'closed');
  return (
    <Stack spacing={3}>
      <Stack component="section" spacing={2} aria-labelledby="open-days">
        <Typography id="open-days" variant="h2">
          Open days
        </Typography>
        {open.length === 0 ? (
          <Typography>No canning day is open.</Typography>
        ) : (
          open.map((d) => <DayCard key={d.id} day={d} />)
        )}
      </Stack>
      {closed.length > 0 ? (
        <Stack component="section" spacing={2} aria-labelledby="closed-days">
          <Typography id="closed-days" variant="h2">
            Closed days
          </Typography>
          {closed.map((d) => (
            <DayCard key={d.id} day={d} />
          ))}
        </Stack>
      ) : null}
    </Stack>
  );
}
