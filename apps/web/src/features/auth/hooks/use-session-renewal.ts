import { useEffect } from 'react';
import { MIN_RENEW_DELAY_MS, RENEW_BEFORE_EXPIRY_MS } from '../../../config/env';
import { useSessionStore } from '../stores/session-store';
import { renewSession } from '../utils/session';

/**
 * Keeps a long canning day signed in: renews the access token shortly before it expires, and at once when
 * a sleeping tablet wakes with a token that is about to lapse (timers do not run while a tab sleeps).
 */
export function useSessionRenewal(): void {
  const expiresAt = useSessionStore((s) => s.accessTokenExpiresAt);

  useEffect(() => {
    if (!expiresAt) return;
    const dueIn = () => Date.parse(expiresAt) - Date.now() - RENEW_BEFORE_EXPIRY_MS;
    const timer = window.setTimeout(() => void renewSession(), Math.max(dueIn(), MIN_RENEW_DELAY_MS));
    const onVisible = () => {
      if (document.visibilityState === 'visible' && dueIn() <= 0) void renewSession();
    };
    document.addEventListener('visibilitychange', onVisible);
    return () => {
      window.clearTimeout(timer);
      document.removeEventListener('visibilitychange', onVisible);
    };
  }, [expiresAt]);
}
