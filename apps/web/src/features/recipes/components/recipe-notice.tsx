import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';

/** What the recipe page says about how the cook got there: just saved, just copied, or saved and marked untested. */
export type RecipePageNotice = { kind: 'saved' } | { kind: 'copied' } | { kind: 'untested'; message: string };

/** Reads a notice from router state, ignoring anything else that may sit there. */
export function noticeFromState(state: unknown): RecipePageNotice | null {
  if (typeof state !== 'object' || state === null || !('notice' in state)) return null;
  const notice = state.notice as { kind?: unknown; message?: unknown } | null;
  if (notice?.kind === 'saved' || notice?.kind === 'copied') return { kind: notice.kind };
  if (notice?.kind === 'untested' && typeof notice.message === 'string') {
    return { kind: 'untested', message: notice.message };
  }
  return null;
}

/** The banner at the top of the recipe page. An untested notice is a warning the cook must not miss. */
export function RecipeNoticeBanner({ notice, onClose }: { notice: RecipePageNotice; onClose: () => void }) {
  if (notice.kind === 'untested') {
    return (
      <Alert severity="warning" role="alert" onClose={onClose} sx={{ mb: 3, fontSize: '1.125rem' }}>
        <AlertTitle>Saved, and now marked untested</AlertTitle>
        {notice.message}
      </Alert>
    );
  }
  return (
    <Alert severity="success" role="status" onClose={onClose} sx={{ mb: 3 }}>
      {notice.kind === 'copied' ? 'Copied into your recipe box. It is now this kitchen’s own recipe.' : 'Recipe saved.'}
    </Alert>
  );
}
