import type { CaughtMailView } from '@jarday/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

/** GET /api/dev/mail: only on a server running its loopback mail catcher (development, demo), and only locally. */
export function getCaughtMail(): Promise<CaughtMailView[]> {
  return api.get<CaughtMailView[]>('/dev/mail');
}

export const caughtMailQueryOptions = () =>
  queryOptions({ queryKey: ['dev-mail'] as const, queryFn: getCaughtMail, refetchInterval: 5000, retry: false });

export const useCaughtMail = () => useQuery(caughtMailQueryOptions());
