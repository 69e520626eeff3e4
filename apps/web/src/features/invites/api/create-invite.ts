import type { CreateInviteInput, InviteView } from '@jarday/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { inviteKeys } from './invite-keys';

/** POST /api/kitchens/:kitchenId/invites (lead only). */
export function createInvite(kitchenId: string, input: CreateInviteInput): Promise<InviteView> {
  return api.post<InviteView>(`/kitchens/${encodeURIComponent(kitchenId)}/invites`, input);
}

export function useCreateInvite(kitchenId: string, options: { onSuccess?: (invite: InviteView) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateInviteInput) => createInvite(kitchenId, input),
    onSuccess: async (invite) => {
      options.onSuccess?.(invite);
      await queryClient.invalidateQueries({ queryKey: inviteKeys.list(kitchenId) });
    },
  });
}
