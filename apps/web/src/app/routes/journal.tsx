import { type JournalQuery, journalQuerySchema } from '@jarday/contracts';
import type { QueryClient } from '@tanstack/react-query';
import { type LoaderFunctionArgs, useParams, useSearchParams } from 'react-router-dom';
import { PageHeader } from '../../components/ui/page-header';
import { dayReviewQueryOptions, useDayReview } from '../../features/journal/api/journal-api';
import { JournalScreen } from '../../features/journal/components/journal-screen';
import { dayPaths } from '../../features/day/utils/day-paths';
import { kitchenQueryOptions } from '../../features/kitchens/api/get-kitchen';
import { ensureQuietly, WithKitchen } from './with-kitchen';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) =>
    ensureQuietly(
      Promise.all([
        queryClient.ensureQueryData(kitchenQueryOptions(params.kitchenId ?? '')),
        queryClient.ensureQueryData(dayReviewQueryOptions(params.kitchenId ?? '', params.dayId ?? '')),
      ]),
    );

/** The filters live in the address (`?station=&loadId=&kind=`), so a filtered journal can be shared or reloaded. */
function useFilter(): [JournalQuery, (next: JournalQuery) => void] {
  const [search, setSearch] = useSearchParams();
  const raw = Object.fromEntries(
    ['station', 'loadId', 'kind'].flatMap((k) => (search.get(k) ? [[k, search.get(k)]] : [])),
  );
  const parsed = journalQuerySchema.safeParse(raw);
  const filter = parsed.success ? parsed.data : {};
  const set = (next: JournalQuery) => {
    const params = new URLSearchParams();
    for (const [k, v] of Object.entries(next)) if (v) params.set(k, String(v));
    setSearch(params, { replace: true });
  };
  return [filter, set];
}

function Title({ kitchenId, dayId, kitchenName }: { kitchenId: string; dayId: string; kitchenName: string }) {
  const review = useDayReview(kitchenId, dayId);
  return (
    <PageHeader
      title={review.data ? `Journal: ${review.data.day.title}` : 'Journal'}
      subtitle={kitchenName}
      back={{ to: dayPaths.list(kitchenId), label: 'Canning days' }}
    />
  );
}

/** /kitchens/:kitchenId/days/:dayId/journal: the day's record, for any member, watchers included. */
export default function JournalRoute() {
  const { dayId = '' } = useParams();
  const [filter, setFilter] = useFilter();
  return (
    <WithKitchen>
      {(kitchen) => (
        <>
          <Title kitchenId={kitchen.id} dayId={dayId} kitchenName={kitchen.name} />
          <JournalScreen kitchenId={kitchen.id} dayId={dayId} filter={filter} onFilter={setFilter} />
        </>
      )}
    </WithKitchen>
  );
}
