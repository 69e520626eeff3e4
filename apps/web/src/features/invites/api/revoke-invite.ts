import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { inviteKeys } from './invite-keys';

/** DELETE /api/kitchens/:kitchenId/invites/:inviteId: the code stops working at once. */
export function revokeInvite(kitchenId: string, inviteId: string): Promise<void> {
  return api.delete(`/kitchens/${encodeURIComponent(kitchenId)}/invites/${encodeURIComponent(inviteId)}`);
}

export function useRevokeInvite(kitchenId: string, options: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (inviteId: string) => revokeInvite(kitchenId, inviteId),
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: inviteKeys.list(kitchenId) });
      options.onSuccess?.();
    },
  });
}
