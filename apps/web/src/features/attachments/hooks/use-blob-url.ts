import { useEffect, useState } from 'react';
import { fetchAttachmentBlob } from '../api/attachment-blob';

export type BlobUrlState =
  { status: 'loading' } | { status: 'ready'; url: string } | { status: 'error'; message: string };

/**
 * A blob: URL of an attachment's file or thumbnail, fetched with the bearer header, revoked when the component
 * goes away or asks for another one, so a long day of photos does not pile up in memory.
 */
export function useBlobUrl(kitchenId: string, attachmentId: string | null, which: 'file' | 'thumb'): BlobUrlState {
  const key = attachmentId ? `${kitchenId}/${attachmentId}/${which}` : null;
  // The answer remembers which file it is for, so a new request reads as loading without a reset in the effect.
  const [answer, setAnswer] = useState<{ key: string; state: BlobUrlState } | null>(null);
  useEffect(() => {
    if (!key || !attachmentId) return;
    const controller = new AbortController();
    let url: string | null = null;
    fetchAttachmentBlob(kitchenId, attachmentId, which, controller.signal).then(
      (blob) => {
        url = URL.createObjectURL(blob);
        setAnswer({ key, state: { status: 'ready', url } });
      },
      (error: unknown) => {
        if (controller.signal.aborted) return;
        const message = error instanceof Error ? error.message : 'Could not load the file';
        setAnswer({ key, state: { status: 'error', message } });
      },
    );
    return () => {
      controller.abort();
      if (url) URL.revokeObjectURL(url);
    };
  }, [key, kitchenId, attachmentId, which]);
  return answer && answer.key === key ? answer.state : { status: 'loading' };
}
