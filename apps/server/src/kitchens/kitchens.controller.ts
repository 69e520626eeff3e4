import {
  createKitchenSchema,
  idSchema,
  type KitchenView,
  type MemberView,
  type MyMembershipView,
  updateKitchenSchema,
  type UpdateKitchenInput,
  updateMemberSchema,
  type UpdateMemberInput,
  updateMyMembershipSchema,
  type UpdateMyMembershipInput,
} from '@jarday/contracts';
import { Body, Controller, Delete, Get, HttpCode, Param, Patch, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { z } from 'zod';
import { type AuthUser, CurrentUser } from '../auth/auth.decorators.js';
import { ApiZodBody } from '../common/openapi.js';
import { AnyMember, CurrentMembership, KitchenRoles } from './kitchen-role.guard.js';
import type { MembershipRow } from './kitchens.repository.js';
import { KitchensService } from './kitchens.service.js';

@ApiTags('kitchens')
@ApiBearerAuth()
@Controller('kitchens')
export class KitchensController {
  constructor(private readonly kitchens: KitchensService) {}

  @Get()
  list(@CurrentUser() user: AuthUser): KitchenView[] {
    return this.kitchens.list(user.id);
  }

  @Post()
  @ApiZodBody(createKitchenSchema)
  create(
    @CurrentUser() user: AuthUser,
    @Body({ schema: createKitchenSchema }) body: z.output<typeof createKitchenSchema>,
  ): KitchenView {
    return this.kitchens.create(user.id, body);
  }

  @Get(':kitchenId')
  @AnyMember()
  get(@Param('kitchenId') kitchenId: string, @CurrentUser() user: AuthUser): KitchenView {
    return this.kitchens.get(kitchenId, user.id);
  }

  @Patch(':kitchenId')
  @KitchenRoles('lead')
  @ApiZodBody(updateKitchenSchema)
  update(
    @Param('kitchenId') kitchenId: string,
    @CurrentUser() user: AuthUser,
    @Body({ schema: updateKitchenSchema }) body: UpdateKitchenInput,
  ): KitchenView {
    return this.kitchens.update(kitchenId, user.id, body);
  }

  @Get(':kitchenId/members')
  @AnyMember()
  members(@Param('kitchenId') kitchenId: string): MemberView[] {
    return this.kitchens.members(kitchenId);
  }

  /** Declared before `members/:userId`, so "me" is never read as an id. */
  @Get(':kitchenId/members/me')
  @AnyMember()
  me(@CurrentMembership() member: MembershipRow): MyMembershipView {
    return this.kitchens.myMembership(member);
  }

  @Patch(':kitchenId/members/me')
  @AnyMember()
  @ApiZodBody(updateMyMembershipSchema)
  updateMe(
    @CurrentMembership() member: MembershipRow,
    @Body({ schema: updateMyMembershipSchema }) body: UpdateMyMembershipInput,
  ): MyMembershipView {
    return this.kitchens.updateMyMembership(member, body);
  }

  @Patch(':kitchenId/members/:userId')
  @KitchenRoles('lead')
  @ApiZodBody(updateMemberSchema)
  changeRole(
    @Param('kitchenId') kitchenId: string,
    @Param('userId', { schema: idSchema }) userId: string,
    @Body({ schema: updateMemberSchema }) body: UpdateMemberInput,
  ): MemberView {
    return this.kitchens.changeRole(kitchenId, userId, body.role);
  }

  @Delete(':kitchenId/members/:userId')
  @AnyMember()
  @HttpCode(204)
  remove(
    @Param('kitchenId') kitchenId: string,
    @Param('userId', { schema: idSchema }) userId: string,
    @CurrentMembership() actor: MembershipRow,
  ): void {
    this.kitchens.removeMember(kitchenId, actor, userId);
  }
}
