import type { SessionView } from '@jarday/contracts';
import { api } from '../../../lib/api-client';

/** POST /api/auth/refresh: trades the httpOnly refresh cookie for a new session. */
export function refreshSession(): Promise<SessionView> {
  return api.post<SessionView>('/auth/refresh', undefined, { credentials: 'include', retryOnUnauthorized: false });
}
