import type { SessionView, UserView } from '@jarday/contracts';
import { create } from 'zustand';

/** `unknown` until the start-up refresh has answered; then one of the other two. */
export type SessionStatus = 'unknown' | 'signed-in' | 'signed-out';

/** Why the last session ended: a deliberate sign-out does not bring the next person back to the same page. */
export type SessionEnd = 'signed-out' | 'expired' | null;

interface SessionState {
  status: SessionStatus;
  user: UserView | null;
  /** Kept in memory only: a reload gets a new one through the refresh cookie. */
  accessToken: string | null;
  accessTokenExpiresAt: string | null;
  endedBy: SessionEnd;
  setSession: (session: SessionView) => void;
  clear: (endedBy?: Exclude<SessionEnd, null>) => void;
}

export const useSessionStore = create<SessionState>()((set) => ({
  status: 'unknown',
  user: null,
  accessToken: null,
  accessTokenExpiresAt: null,
  endedBy: null,
  setSession: (session) =>
    set({
      status: 'signed-in',
      user: session.user,
      accessToken: session.accessToken,
      accessTokenExpiresAt: session.accessTokenExpiresAt,
      endedBy: null,
    }),
  clear: (endedBy = 'expired') =>
    set({ status: 'signed-out', user: null, accessToken: null, accessTokenExpiresAt: null, endedBy }),
}));

/** The signed-in person, or null. */
export const useCurrentUser = () => useSessionStore((s) => s.user);
export const useSessionStatus = () => useSessionStore((s) => s.status);
