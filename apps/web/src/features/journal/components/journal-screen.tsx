import type { JournalQuery } from '@jarday/contracts';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { lazy, Suspense } from 'react';
import { Loading, QueryError } from '../../../components/ui/query-state';
import { useDayReview, useJournal } from '../api/journal-api';
import { AlarmRings, DaySummaryCards } from './day-summary-cards';
import { EntryList } from './entry-list';
import { ExportButtons } from './export-buttons';
import { JournalFilters } from './journal-filters';

// The chart package is the heaviest part of the page: it loads beside the summary rather than before it.
const TimelineChart = lazy(() => import('./timeline-chart').then((m) => ({ default: m.TimelineChart })));

interface JournalScreenProps {
  kitchenId: string;
  dayId: string;
  filter: JournalQuery;
  onFilter: (next: JournalQuery) => void;
}

/** A day's record: summary, timeline picture, the filtered entries, and the exports. */
export function JournalScreen({ kitchenId, dayId, filter, onFilter }: JournalScreenProps) {
  const review = useDayReview(kitchenId, dayId);
  const journal = useJournal(kitchenId, dayId, filter);
  if (review.isPending) return <Loading label="Loading the day's record" />;
  if (review.isError) return <QueryError error={review.error} onRetry={() => void review.refetch()} />;
  const { day, summary, lanes, until } = review.data;
  return (
    <Stack spacing={4}>
      <Stack direction={{ xs: 'column', sm: 'row' }} sx={{ justifyContent: 'space-between', gap: 2 }}>
        <Typography>
          {day.date} · {day.altitude.value.toLocaleString()} {day.altitude.unit} ·{' '}
          {day.status === 'open' ? 'open' : 'closed'}
        </Typography>
        <ExportButtons kitchenId={kitchenId} dayId={dayId} date={day.date} />
      </Stack>
      <Stack component="section" spacing={2} aria-labelledby="summary-heading">
        <Typography id="summary-heading" variant="h2">
          Summary
        </Typography>
        <DaySummaryCards summary={summary} />
      </Stack>
      <Stack component="section" spacing={2} aria-labelledby="timeline-heading">
        <Typography id="timeline-heading" variant="h2">
          Timeline
        </Typography>
        <Card>
          <CardContent>
            <Suspense fallback={<Loading label="Drawing the timeline" />}>
              <TimelineChart lanes={lanes} start={summary.firstAt ?? until} until={until} />
            </Suspense>
          </CardContent>
        </Card>
      </Stack>
      <AlarmRings summary={summary} />
      <Stack component="section" spacing={2} aria-labelledby="entries-heading">
        <Typography id="entries-heading" variant="h2">
          What happened
        </Typography>
        {journal.isPending ? <Loading label="Loading the entries" /> : null}
        {journal.isError ? <QueryError error={journal.error} onRetry={() => void journal.refetch()} /> : null}
        {journal.data ? (
          <>
            <JournalFilters view={journal.data} filter={filter} onChange={onFilter} />
            <Typography role="status" sx={{ color: 'text.secondary' }}>
              {journal.data.entries.length} of {journal.data.total} entries
            </Typography>
            <EntryList entries={journal.data.entries} />
          </>
        ) : null}
      </Stack>
    </Stack>
  );
}
