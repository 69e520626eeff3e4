/** Query keys of the invites feature. */
export const inviteKeys = {
  all: ['invites'] as const,
  list: (kitchenId: string) => [...inviteKeys.all, 'list', kitchenId] as const,
  preview: (code: string) => [...inviteKeys.all, 'preview', code] as const,
};
