import type { RegisterInput, SessionView } from '@jarday/contracts';
import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { useSessionStore } from '../stores/session-store';

/** POST /api/auth/register; 409 `email_taken` when the address already has an account. */
export function register(input: RegisterInput): Promise<SessionView> {
  return api.post<SessionView>('/auth/register', input, { credentials: 'include', retryOnUnauthorized: false });
}

export function useRegister(options: { onSuccess?: (session: SessionView) => void } = {}) {
  const setSession = useSessionStore((s) => s.setSession);
  return useMutation({
    mutationFn: register,
    onSuccess: (session) => {
      setSession(session);
      options.onSuccess?.(session);
    },
  });
}
