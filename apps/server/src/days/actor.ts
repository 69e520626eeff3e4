import { deviceIdSchema } from '@jarday/contracts';
import type { AuthUser } from '../auth/auth.decorators.js';
import type { MembershipRow } from '../kitchens/kitchens.repository.js';
import type { Actor } from './days.service.js';

/** REST callers may name their device (the same id the socket uses) so the journal can say where a change came from. */
export const actorOf = (user: AuthUser, member: MembershipRow, device: string | undefined): Actor => ({
  userId: user.id,
  name: user.name,
  role: member.role,
  deviceId: deviceIdSchema.safeParse(device).data ?? null,
});
