import type { MemberView, Role } from '@jarday/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { memberKeys } from './member-keys';

/** PATCH /api/kitchens/:kitchenId/members/:userId (lead only); 409 `last_lead` if no lead would remain. */
export function updateMember(kitchenId: string, userId: string, role: Role): Promise<MemberView> {
  return api.patch<MemberView>(`/kitchens/${encodeURIComponent(kitchenId)}/members/${encodeURIComponent(userId)}`, {
    role,
  });
}

export function useUpdateMember(kitchenId: string, options: { onSuccess?: (member: MemberView) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, role }: { userId: string; role: Role }) => updateMember(kitchenId, userId, role),
    onSuccess: async (member) => {
      await queryClient.invalidateQueries({ queryKey: memberKeys.list(kitchenId) });
      options.onSuccess?.(member);
    },
  });
}
