import type { AttachmentSubject } from '@jarday/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { attachmentKeys, attachmentsPath } from './attachment-keys';

/** DELETE /api/kitchens/:kitchenId/attachments/:attachmentId (a lead, or the person who added it). */
export function deleteAttachment(kitchenId: string, attachmentId: string): Promise<void> {
  return api.delete(`${attachmentsPath(kitchenId)}/${encodeURIComponent(attachmentId)}`);
}

export function useDeleteAttachment(kitchenId: string, subject: AttachmentSubject, subjectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (attachmentId: string) => deleteAttachment(kitchenId, attachmentId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: attachmentKeys.list(kitchenId, subject, subjectId) }),
  });
}
