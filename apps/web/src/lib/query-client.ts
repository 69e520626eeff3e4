import { QueryClient } from '@tanstack/react-query';
import { ApiError } from './api-client';

/** A 4xx answer will not change on retry (not found, forbidden, bad input); network and 5xx errors might. */
function shouldRetry(failureCount: number, error: unknown): boolean {
  if (error instanceof ApiError && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}

/** The app's query client; tests build a fresh one per test with retries off. */
export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: { staleTime: 30_000, retry: shouldRetry, refetchOnWindowFocus: true },
      mutations: { retry: false },
    },
  });
}
