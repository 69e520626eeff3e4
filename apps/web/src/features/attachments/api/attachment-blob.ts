import { apiBlob } from '../../../lib/api-client';
import { attachmentsPath } from './attachment-keys';

/** GET .../attachments/:id/file or /thumb as a Blob (the bearer header goes with it, renewed once on a 401). */
export function fetchAttachmentBlob(
  kitchenId: string,
  attachmentId: string,
  which: 'file' | 'thumb',
  signal?: AbortSignal,
): Promise<Blob> {
  return apiBlob(`${attachmentsPath(kitchenId)}/${encodeURIComponent(attachmentId)}/${which}`, { signal });
}
