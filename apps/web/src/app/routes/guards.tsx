import { Navigate, Outlet, useLocation, useSearchParams } from 'react-router-dom';
import { paths, safeReturnPath } from '../../config/paths';
import { useSessionStatus, useSessionStore } from '../../features/auth/stores/session-store';

/** Pages for signed-in people; when the session ends mid-use, go to sign-in and come back here after. */
export function RequireAuth() {
  const status = useSessionStatus();
  const endedBy = useSessionStore((s) => s.endedBy);
  const location = useLocation();
  if (status !== 'signed-in') {
    const next = endedBy === 'signed-out' ? undefined : location.pathname + location.search;
    return <Navigate to={paths.signIn(next)} replace />;
  }
  return <Outlet />;
}

/** Sign-in and registration: a signed-in person goes straight on to where they were headed. */
export function PublicOnly() {
  const status = useSessionStatus();
  const [params] = useSearchParams();
  if (status === 'signed-in') return <Navigate to={safeReturnPath(params.get('next'))} replace />;
  return <Outlet />;
}
