import { useState } from 'react';
import { SessionGate } from '../features/auth/components/session-gate';
import { bindSessionToApiClient } from '../features/auth/utils/session';
import { createQueryClient } from '../lib/query-client';
import { AppProvider } from './provider';
import { AppRouter } from './router';

// Bound before the first request: the start-up refresh and every page's calls use this session.
bindSessionToApiClient();

export function App() {
  const [queryClient] = useState(createQueryClient);
  return (
    <AppProvider queryClient={queryClient}>
      <SessionGate>
        <AppRouter queryClient={queryClient} />
      </SessionGate>
    </AppProvider>
  );
}
