import type { InviteView } from '@jarday/contracts';
import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

/**
 * POST /api/kitchens/:kitchenId/invites (lead): a helper invite for someone's phone, shown on the board. The same
 * endpoint as the members page; kept here so the board does not load that feature.
 */
export function createPhoneInvite(kitchenId: string): Promise<InviteView> {
  return api.post<InviteView>(`/kitchens/${encodeURIComponent(kitchenId)}/invites`, {
    role: 'helper',
    expiresInDays: 1,
  });
}

export const useCreatePhoneInvite = (kitchenId: string) =>
  useMutation({ mutationFn: () => createPhoneInvite(kitchenId) });
