import type { InvitePreview } from '@jarday/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { inviteKeys } from './invite-keys';

/** GET /api/invites/:code: which kitchen and role a code opens; 404 `invite_not_found`. */
export function getInvitePreview(code: string): Promise<InvitePreview> {
  return api.get<InvitePreview>(`/invites/${encodeURIComponent(code)}`);
}

/** `code` is the normalised code (eight characters, no dash). */
export const invitePreviewQueryOptions = (code: string) =>
  queryOptions({ queryKey: inviteKeys.preview(code), queryFn: () => getInvitePreview(code) });

export const useInvitePreview = (code: string | null) =>
  useQuery({ ...invitePreviewQueryOptions(code ?? ''), enabled: code !== null });
