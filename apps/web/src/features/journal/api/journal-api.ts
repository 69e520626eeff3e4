import type { DayReviewView, JournalQuery, JournalView, PastDayView, YesterdayView } from '@jarday/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api, apiBlob } from '../../../lib/api-client';
import { saveFile } from '../../../lib/save-file';

const kitchenPath = (kitchenId: string) => `/kitchens/${encodeURIComponent(kitchenId)}`;
const dayPath = (kitchenId: string, dayId: string) => `${kitchenPath(kitchenId)}/days/${encodeURIComponent(dayId)}`;

/** Query keys of the Journal, broad to narrow. */
export const journalKeys = {
  all: ['journal'] as const,
  entries: (dayId: string, filter: JournalQuery) => [...journalKeys.all, 'entries', dayId, filter] as const,
  review: (dayId: string) => [...journalKeys.all, 'review', dayId] as const,
  pastDays: (kitchenId: string) => [...journalKeys.all, 'past', kitchenId] as const,
  yesterday: (kitchenId: string) => [...journalKeys.all, 'yesterday', kitchenId] as const,
};

/** `?station=&loadId=&kind=`, only the filters that are set. */
export function filterSearch(filter: JournalQuery): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(filter)) if (value) params.set(key, String(value));
  const text = params.toString();
  return text ? `?${text}` : '';
}

/** GET .../days/:dayId/journal (any member): the day's entries that match the filter. */
export const journalQueryOptions = (kitchenId: string, dayId: string, filter: JournalQuery) =>
  queryOptions({
    queryKey: journalKeys.entries(dayId, filter),
    queryFn: () => api.get<JournalView>(`${dayPath(kitchenId, dayId)}/journal${filterSearch(filter)}`),
    // The chips stay put while the next filter loads.
    placeholderData: keepPreviousData,
  });
export const useJournal = (kitchenId: string, dayId: string, filter: JournalQuery) =>
  useQuery(journalQueryOptions(kitchenId, dayId, filter));

/** GET .../days/:dayId/summary: the summary and the timeline lanes. */
export const dayReviewQueryOptions = (kitchenId: string, dayId: string) =>
  queryOptions({
    queryKey: journalKeys.review(dayId),
    queryFn: () => api.get<DayReviewView>(`${dayPath(kitchenId, dayId)}/summary`),
  });
export const useDayReview = (kitchenId: string, dayId: string) => useQuery(dayReviewQueryOptions(kitchenId, dayId));

/** GET /api/kitchens/:kitchenId/journal/days: the kitchen's days with their figures. */
export const pastDaysQueryOptions = (kitchenId: string) =>
  queryOptions({
    queryKey: journalKeys.pastDays(kitchenId),
    queryFn: () => api.get<PastDayView[]>(`${kitchenPath(kitchenId)}/journal/days?limit=30`),
  });
export const usePastDays = (kitchenId: string) => useQuery(pastDaysQueryOptions(kitchenId));

/** GET /api/kitchens/:kitchenId/journal/yesterday: the latest closed day, or none. */
export const yesterdayQueryOptions = (kitchenId: string) =>
  queryOptions({
    queryKey: journalKeys.yesterday(kitchenId),
    queryFn: () => api.get<YesterdayView>(`${kitchenPath(kitchenId)}/journal/yesterday`),
  });
export const useYesterday = (kitchenId: string) => useQuery(yesterdayQueryOptions(kitchenId));

/** Fetches an export with the session's token and hands it to the browser as a download. */
export async function downloadExport(
  kitchenId: string,
  dayId: string,
  kind: 'csv' | 'pdf',
  fileName: string,
  filter: JournalQuery = {},
): Promise<void> {
  const path = kind === 'csv' ? `/journal.csv${filterSearch(filter)}` : '/record.pdf';
  saveFile(await apiBlob(`${dayPath(kitchenId, dayId)}${path}`), fileName);
}
