import type { AttachmentSubject, AttachmentView } from '@jarday/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { attachmentKeys, attachmentsPath } from './attachment-keys';

/** GET /api/kitchens/:kitchenId/attachments?subject=&subjectId= */
export function getAttachments(
  kitchenId: string,
  subject: AttachmentSubject,
  subjectId: string,
): Promise<AttachmentView[]> {
  const query = new URLSearchParams({ subject, subjectId });
  return api.get<AttachmentView[]>(`${attachmentsPath(kitchenId)}?${query.toString()}`);
}

export const attachmentsQueryOptions = (kitchenId: string, subject: AttachmentSubject, subjectId: string) =>
  queryOptions({
    queryKey: attachmentKeys.list(kitchenId, subject, subjectId),
    queryFn: () => getAttachments(kitchenId, subject, subjectId),
  });

export const useAttachments = (kitchenId: string, subject: AttachmentSubject, subjectId: string) =>
  useQuery(attachmentsQueryOptions(kitchenId, subject, subjectId));
