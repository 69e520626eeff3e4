import { ApiError, bindAuth } from '../../../lib/api-client';
import { refreshSession } from '../api/refresh-session';
import { useSessionStore } from '../stores/session-store';

let renewing: Promise<string | null> | null = null;

/** True when the answer means the refresh cookie is gone or spent, not that the server is away. */
const sessionIsGone = (error: unknown) => error instanceof ApiError && error.status >= 400 && error.status < 500;

/**
 * Trades the refresh cookie for a new access token. One renewal at a time: the server rotates the cookie,
 * so a parallel second call would be refused. When the server says the session has ended, the local session
 * is cleared (the route guard then sends the person to sign-in with their return path). A network failure
 * keeps the session, so a brief Wi-Fi drop on the counter tablet does not sign anyone out.
 */
export function renewSession(): Promise<string | null> {
  renewing ??= refreshSession()
    .then(
      (session) => {
        useSessionStore.getState().setSession(session);
        return session.accessToken;
      },
      (error: unknown) => {
        if (sessionIsGone(error)) useSessionStore.getState().clear();
        return null;
      },
    )
    .finally(() => {
      renewing = null;
    });
  return renewing;
}

export type RestoreOutcome = 'signed-in' | 'signed-out' | 'unreachable';

let restoring: Promise<RestoreOutcome> | null = null;

/**
 * Start-up: restores the session after a reload from the refresh cookie. Shared while in flight (React's
 * strict mode mounts twice, and a second refresh would present an already rotated cookie).
 */
export function restoreSession(): Promise<RestoreOutcome> {
  restoring ??= attemptRestore().finally(() => {
    restoring = null;
  });
  return restoring;
}

async function attemptRestore(): Promise<RestoreOutcome> {
  try {
    useSessionStore.getState().setSession(await refreshSession());
    return 'signed-in';
  } catch (error) {
    if (sessionIsGone(error)) {
      useSessionStore.getState().clear();
      return 'signed-out';
    }
    return 'unreachable';
  }
}

/** Lets the API client attach the bearer token and renew it on a 401. */
export function bindSessionToApiClient(): () => void {
  return bindAuth({
    getAccessToken: () => useSessionStore.getState().accessToken,
    renewAccessToken: renewSession,
  });
}
