import { attachmentsPath } from './attachment-keys';
import { authedFetch } from './authed-fetch';

/** GET .../attachments/:id/file or /thumb as a Blob (the bearer header goes with it). */
export async function fetchAttachmentBlob(
  kitchenId: string,
  attachmentId: string,
  which: 'file' | 'thumb',
  signal?: AbortSignal,
): Promise<Blob> {
  const response = await authedFetch(`${attachmentsPath(kitchenId)}/${encodeURIComponent(attachmentId)}/${which}`, {
    signal,
  });
  return response.blob();
}
