import type { DemoAccount } from '@jarday/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export interface DemoAccountsView {
  demoMode: boolean;
  accounts: DemoAccount[];
}

/** GET /api/auth/demo-accounts (public): invented accounts, listed only when the server runs in demo mode. */
export function getDemoAccounts(): Promise<DemoAccountsView> {
  return api.get<DemoAccountsView>('/auth/demo-accounts', { retryOnUnauthorized: false });
}

export const demoAccountsQueryOptions = () =>
  queryOptions({ queryKey: ['auth', 'demo-accounts'], queryFn: getDemoAccounts, staleTime: Infinity });

export const useDemoAccounts = () => useQuery(demoAccountsQueryOptions());
