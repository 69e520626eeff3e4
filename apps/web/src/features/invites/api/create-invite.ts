import type { CreatedInviteView, CreateInviteInput } from '@jarday/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { inviteKeys } from './invite-keys';

/** POST /api/kitchens/:kitchenId/invites (lead only). */
export function createInvite(kitchenId: string, input: CreateInviteInput): Promise<CreatedInviteView> {
  return api.post<CreatedInviteView>(`/kitchens/${encodeURIComponent(kitchenId)}/invites`, input);
}

export function useCreateInvite(kitchenId: string, options: { onSuccess?: (invite: CreatedInviteView) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateInviteInput) => createInvite(kitchenId, input),
    onSuccess: async (invite) => {
      options.onSuccess?.(invite);
      await queryClient.invalidateQueries({ queryKey: inviteKeys.list(kitchenId) });
    },
  });
}
