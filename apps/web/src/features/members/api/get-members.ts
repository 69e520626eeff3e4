import type { MemberView } from '@jarday/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { memberKeys } from './member-keys';

/** GET /api/kitchens/:kitchenId/members */
export function getMembers(kitchenId: string): Promise<MemberView[]> {
  return api.get<MemberView[]>(`/kitchens/${encodeURIComponent(kitchenId)}/members`);
}

export const membersQueryOptions = (kitchenId: string) =>
  queryOptions({ queryKey: memberKeys.list(kitchenId), queryFn: () => getMembers(kitchenId) });

export const useMembers = (kitchenId: string) => useQuery(membersQueryOptions(kitchenId));
