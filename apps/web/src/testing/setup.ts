import { cleanup } from '@testing-library/react';
import { afterEach, vi } from 'vitest';
import { useSessionStore } from '../features/auth/stores/session-store';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
  window.localStorage.clear();
  useSessionStore.getState().clear();
  useSessionStore.setState({ status: 'unknown', endedBy: null });
});
