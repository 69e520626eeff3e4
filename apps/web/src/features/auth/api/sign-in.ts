import type { SessionView, SignInInput } from '@jarday/contracts';
import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { useSessionStore } from '../stores/session-store';

/** POST /api/auth/sign-in; 401 `invalid_credentials`, 429 `too_many_attempts`. */
export function signIn(input: SignInInput): Promise<SessionView> {
  return api.post<SessionView>('/auth/sign-in', input, { credentials: 'include', retryOnUnauthorized: false });
}

export function useSignIn(options: { onSuccess?: (session: SessionView) => void } = {}) {
  const setSession = useSessionStore((s) => s.setSession);
  return useMutation({
    mutationFn: signIn,
    onSuccess: (session) => {
      setSession(session);
      options.onSuccess?.(session);
    },
  });
}
