import CssBaseline from '@mui/material/CssBaseline';
import { ThemeProvider } from '@mui/material/styles';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { useEffect, type ReactNode } from 'react';
import { COLOR_MODE_STORAGE_KEY } from '../config/env';
import { useSessionStore } from '../features/auth/stores/session-store';
import { theme } from './theme';

/** Theme, baseline styles and the query cache; the cache is emptied when the session ends. */
export function AppProvider({ queryClient, children }: { queryClient: QueryClient; children: ReactNode }) {
  useEffect(
    () =>
      useSessionStore.subscribe((state, previous) => {
        // Another person may sign in next on the same tablet: nothing of the last session may linger.
        if (previous.status === 'signed-in' && state.status === 'signed-out') queryClient.clear();
      }),
    [queryClient],
  );

  return (
    <ThemeProvider theme={theme} defaultMode="light" modeStorageKey={COLOR_MODE_STORAGE_KEY} disableTransitionOnChange>
      <CssBaseline />
      <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>
    </ThemeProvider>
  );
}
