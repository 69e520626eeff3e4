import type { AttachmentSubject } from '@jarday/contracts';

/** Query keys of the attachments feature. */
export const attachmentKeys = {
  all: ['attachments'] as const,
  list: (kitchenId: string, subject: AttachmentSubject, subjectId: string) =>
    [...attachmentKeys.all, 'list', kitchenId, subject, subjectId] as const,
};

export const attachmentsPath = (kitchenId: string) => `/kitchens/${encodeURIComponent(kitchenId)}/attachments`;
