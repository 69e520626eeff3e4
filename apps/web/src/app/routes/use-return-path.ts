import { useSearchParams } from 'react-router-dom';
import { safeReturnPath } from '../../config/paths';

/** The `?next=` a guard left behind: where to go after signing in, and whether to pass it on. */
export function useReturnPath(): { next: string; carry: string | undefined } {
  const [params] = useSearchParams();
  const raw = params.get('next');
  const next = safeReturnPath(raw);
  return { next, carry: raw !== null && raw === next ? raw : undefined };
}
