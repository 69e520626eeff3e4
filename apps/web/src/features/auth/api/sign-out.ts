import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { useSessionStore } from '../stores/session-store';

/** POST /api/auth/sign-out: the server forgets the refresh cookie. */
export function signOut(): Promise<void> {
  return api.post<void>('/auth/sign-out', undefined, { credentials: 'include', retryOnUnauthorized: false });
}

/** Signs out; the local session is dropped even if the server cannot be reached. */
export function useSignOut(options: { onSettled?: () => void } = {}) {
  const clear = useSessionStore((s) => s.clear);
  return useMutation({
    mutationFn: signOut,
    onSettled: () => {
      clear('signed-out');
      options.onSettled?.();
    },
  });
}
