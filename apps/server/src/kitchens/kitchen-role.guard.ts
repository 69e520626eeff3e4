import type { Role } from '@jarday/contracts';
import {
  applyDecorators,
  type CanActivate,
  createParamDecorator,
  type ExecutionContext,
  Injectable,
  SetMetadata,
  UseGuards,
} from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { AppError, forbidden } from '../common/app-error.js';
import type { AuthedRequest } from '../auth/auth.decorators.js';
import { KitchensRepository, type MembershipRow } from './kitchens.repository.js';

const KITCHEN_ROLES = 'jarday:kitchenRoles';

interface KitchenRequest extends AuthedRequest {
  params: Record<string, string | undefined>;
  membership?: MembershipRow;
}

/**
 * Checks the caller's role in the kitchen named by the `:kitchenId` route parameter.
 * Not a member: 404, so kitchens of others are not even confirmed to exist. Wrong role: 403.
 */
@Injectable()
export class KitchenRoleGuard implements CanActivate {
  constructor(
    private readonly reflector: Reflector,
    private readonly kitchens: KitchensRepository,
  ) {}

  canActivate(ctx: ExecutionContext): boolean {
    const roles = this.reflector.get<Role[]>(KITCHEN_ROLES, ctx.getHandler()) ?? [];
    const req = ctx.switchToHttp().getRequest<KitchenRequest>();
    const kitchenId = req.params.kitchenId;
    const membership = req.user && kitchenId ? this.kitchens.findMembership(kitchenId, req.user.id) : undefined;
    if (!membership) throw new AppError('not_found', 'Kitchen not found');
    if (!roles.includes(membership.role)) throw forbidden();
    req.membership = membership;
    return true;
  }
}

/** Allows the route to members holding one of `roles` in the route's kitchen. */
export const KitchenRoles = (...roles: Role[]) =>
  applyDecorators(SetMetadata(KITCHEN_ROLES, roles), UseGuards(KitchenRoleGuard));

/** Any member, whatever the role. */
export const AnyMember = () => KitchenRoles('lead', 'helper', 'watcher');

/** The caller's membership, set by KitchenRoleGuard. */
export const CurrentMembership = createParamDecorator((_d: unknown, ctx: ExecutionContext): MembershipRow => {
  const membership = ctx.switchToHttp().getRequest<KitchenRequest>().membership;
  if (!membership) throw new Error('CurrentMembership used without KitchenRoles');
  return membership;
});
