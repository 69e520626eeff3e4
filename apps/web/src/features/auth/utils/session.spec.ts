import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { api } from '../../../lib/api-client';
import { errorBody, stubFetch } from '../../../testing/fetch-stub';
import { ada, orchardKitchen, sessionFor } from '../../../testing/fixtures';
import { useSessionStore } from '../stores/session-store';
import { bindSessionToApiClient, renewSession, restoreSession } from './session';

const expired = { status: 401, body: errorBody(401, 'session_expired', 'Your session has ended. Sign in again.') };

describe('session', () => {
  let unbind: () => void;
  beforeEach(() => {
    unbind = bindSessionToApiClient();
  });
  afterEach(() => unbind());

  it('restores a session from the refresh cookie at start-up', async () => {
    const session = sessionFor(ada, 'restored-token');
    const stub = stubFetch({ 'POST /api/auth/refresh': { status: 200, body: session } });

    await expect(restoreSession()).resolves.toBe('signed-in');
    expect(useSessionStore.getState()).toMatchObject({ status: 'signed-in', user: ada, accessToken: 'restored-token' });
    expect(stub.requests[0]).toMatchObject({ method: 'POST', credentials: 'include' });
  });

  it('is signed out at start-up when the cookie is gone, and "unreachable" when the server is', async () => {
    stubFetch({ 'POST /api/auth/refresh': expired });
    await expect(restoreSession()).resolves.toBe('signed-out');
    expect(useSessionStore.getState().status).toBe('signed-out');

    vi.stubGlobal('fetch', vi.fn().mockRejectedValue(new TypeError('Failed to fetch')));
    await expect(restoreSession()).resolves.toBe('unreachable');
  });

  it('renews a stale token behind a refused call and retries it with the new token', async () => {
    useSessionStore.getState().setSession(sessionFor(ada, 'stale-token'));
    const stub = stubFetch({
      'POST /api/auth/refresh': { status: 200, body: sessionFor(ada, 'fresh-token') },
      'GET /api/kitchens': (req) =>
        req.headers.Authorization === 'Bearer fresh-token' ? { status: 200, body: [orchardKitchen] } : expired,
    });

    await expect(api.get('/kitchens')).resolves.toEqual([orchardKitchen]);
    expect(useSessionStore.getState().accessToken).toBe('fresh-token');
    expect(stub.to('POST /api/auth/refresh')).toHaveLength(1);
  });

  it('sends one refresh for parallel renewals', async () => {
    useSessionStore.getState().setSession(sessionFor(ada, 'stale-token'));
    const stub = stubFetch({ 'POST /api/auth/refresh': { status: 200, body: sessionFor(ada, 'fresh-token') } });

    await expect(Promise.all([renewSession(), renewSession()])).resolves.toEqual(['fresh-token', 'fresh-token']);
    expect(stub.to('POST /api/auth/refresh')).toHaveLength(1);
  });

  it('ends the local session when the server refuses the refresh', async () => {
    useSessionStore.getState().setSession(sessionFor(ada, 'stale-token'));
    stubFetch({ 'POST /api/auth/refresh': expired, 'GET /api/kitchens': expired });

    await expect(api.get('/kitchens')).rejects.toMatchObject({ status: 401 });
    expect(useSessionStore.getState()).toMatchObject({ status: 'signed-out', accessToken: null, user: null });
  });

  it('keeps the session through a network drop during renewal', async () => {
    useSessionStore.getState().setSession(sessionFor(ada, 'stale-token'));
    vi.stubGlobal('fetch', vi.fn().mockRejectedValue(new TypeError('Failed to fetch')));

    await expect(renewSession()).resolves.toBeNull();
    expect(useSessionStore.getState()).toMatchObject({ status: 'signed-in', accessToken: 'stale-token' });
  });
});
