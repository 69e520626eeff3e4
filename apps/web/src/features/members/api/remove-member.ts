import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { memberKeys } from './member-keys';

/** DELETE /api/kitchens/:kitchenId/members/:userId: a lead removes anyone; anyone may remove themself. */
export function removeMember(kitchenId: string, userId: string): Promise<void> {
  return api.delete(`/kitchens/${encodeURIComponent(kitchenId)}/members/${encodeURIComponent(userId)}`);
}

export interface RemoveMemberVariables {
  userId: string;
  /** Leaving: the list is dropped rather than refetched, since I may no longer read it. */
  self: boolean;
}

export function useRemoveMember(
  kitchenId: string,
  options: { onSuccess?: (variables: RemoveMemberVariables) => void } = {},
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId }: RemoveMemberVariables) => removeMember(kitchenId, userId),
    onSuccess: async (_data, variables) => {
      if (variables.self) queryClient.removeQueries({ queryKey: memberKeys.list(kitchenId) });
      else await queryClient.invalidateQueries({ queryKey: memberKeys.list(kitchenId) });
      options.onSuccess?.(variables);
    },
  });
}
