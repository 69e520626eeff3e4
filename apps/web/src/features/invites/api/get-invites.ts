import type { InviteView } from '@jarday/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { inviteKeys } from './invite-keys';

/** GET /api/kitchens/:kitchenId/invites (lead only): invites that still work. */
export function getInvites(kitchenId: string): Promise<InviteView[]> {
  return api.get<InviteView[]>(`/kitchens/${encodeURIComponent(kitchenId)}/invites`);
}

export const invitesQueryOptions = (kitchenId: string) =>
  queryOptions({ queryKey: inviteKeys.list(kitchenId), queryFn: () => getInvites(kitchenId) });

export const useInvites = (kitchenId: string) => useQuery(invitesQueryOptions(kitchenId));
