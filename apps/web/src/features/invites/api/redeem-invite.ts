import type { InvitePreview, KitchenView } from '@jarday/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { inviteKeys } from './invite-keys';

/** POST /api/invites/:code/redeem: joins the kitchen with the invite's role. */
export function redeemInvite(code: string): Promise<KitchenView> {
  return api.post<KitchenView>(`/invites/${encodeURIComponent(code)}/redeem`);
}

export function useRedeemInvite(code: string, options: { onSuccess?: (kitchen: KitchenView) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => redeemInvite(code),
    onSuccess: (kitchen) => {
      // Not refetched: the server may no longer show a used code. The cached preview just learns the answer.
      queryClient.setQueryData<InvitePreview>(inviteKeys.preview(code), (preview) =>
        preview ? { ...preview, alreadyMember: true } : preview,
      );
      options.onSuccess?.(kitchen);
    },
  });
}
