import type { AttachmentSubject, AttachmentView } from '@jarday/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { attachmentKeys, attachmentsPath } from './attachment-keys';
import { authedFetch } from './authed-fetch';

/** POST /api/kitchens/:kitchenId/attachments (multipart: subject, subjectId, file). Leads and helpers. */
export async function uploadAttachment(
  kitchenId: string,
  subject: AttachmentSubject,
  subjectId: string,
  file: File,
): Promise<AttachmentView> {
  const form = new FormData();
  form.append('subject', subject);
  form.append('subjectId', subjectId);
  form.append('file', file, file.name);
  const response = await authedFetch(attachmentsPath(kitchenId), { method: 'POST', body: form });
  return (await response.json()) as AttachmentView;
}

export function useUploadAttachment(kitchenId: string, subject: AttachmentSubject, subjectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => uploadAttachment(kitchenId, subject, subjectId, file),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: attachmentKeys.list(kitchenId, subject, subjectId) }),
  });
}
