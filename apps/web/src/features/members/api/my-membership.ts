import type { MyMembershipView, UpdateMyMembershipInput } from '@jarday/contracts';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { memberKeys } from './member-keys';

const mePath = (kitchenId: string) => `/kitchens/${encodeURIComponent(kitchenId)}/members/me`;

/** GET /api/kitchens/:kitchenId/members/me: my own membership, with my reminder choice. */
export function getMyMembership(kitchenId: string): Promise<MyMembershipView> {
  return api.get<MyMembershipView>(mePath(kitchenId));
}

/** PATCH /api/kitchens/:kitchenId/members/me: any member changes their own choice. */
export function updateMyMembership(kitchenId: string, input: UpdateMyMembershipInput): Promise<MyMembershipView> {
  return api.patch<MyMembershipView>(mePath(kitchenId), input);
}

export const myMembershipQueryOptions = (kitchenId: string) =>
  queryOptions({ queryKey: memberKeys.me(kitchenId), queryFn: () => getMyMembership(kitchenId) });

export const useMyMembership = (kitchenId: string) => useQuery(myMembershipQueryOptions(kitchenId));

export function useUpdateMyMembership(kitchenId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateMyMembershipInput) => updateMyMembership(kitchenId, input),
    onSuccess: (me) => queryClient.setQueryData(memberKeys.me(kitchenId), me),
  });
}
