import {
  type CreatedInviteView,
  createInviteSchema,
  idSchema,
  inviteCodeSchema,
  type InvitePreview,
  type InviteView,
} from '@jarday/contracts';
import type { KitchenView } from '@jarday/contracts';
import { Body, Controller, Delete, Get, HttpCode, Param, Post, Req } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { Request } from 'express';
import type { z } from 'zod';
import { type AuthUser, CurrentUser } from '../auth/auth.decorators.js';
import { ApiZodBody } from '../common/openapi.js';
import { KitchenRoles } from '../kitchens/kitchen-role.guard.js';
import { InvitesService } from './invites.service.js';

@ApiTags('invites')
@ApiBearerAuth()
@Controller()
export class InvitesController {
  constructor(private readonly invites: InvitesService) {}

  @Get('kitchens/:kitchenId/invites')
  @KitchenRoles('lead')
  list(@Param('kitchenId') kitchenId: string): InviteView[] {
    return this.invites.listOpen(kitchenId);
  }

  @Post('kitchens/:kitchenId/invites')
  @KitchenRoles('lead')
  @ApiZodBody(createInviteSchema)
  create(
    @Param('kitchenId') kitchenId: string,
    @CurrentUser() user: AuthUser,
    @Body({ schema: createInviteSchema }) body: z.output<typeof createInviteSchema>,
    @Req() req: Request,
  ): CreatedInviteView {
    return this.invites.create(kitchenId, user.id, body, {
      origin: req.get('origin'),
      protocol: req.protocol,
      host: req.get('host'),
    });
  }

  @Delete('kitchens/:kitchenId/invites/:inviteId')
  @KitchenRoles('lead')
  @HttpCode(204)
  revoke(@Param('kitchenId') kitchenId: string, @Param('inviteId', { schema: idSchema }) inviteId: string): void {
    this.invites.revoke(kitchenId, inviteId);
  }

  @Get('invites/:code')
  preview(@Param('code', { schema: inviteCodeSchema }) code: string, @CurrentUser() user: AuthUser): InvitePreview {
    return this.invites.preview(code, user.id);
  }

  @Post('invites/:code/redeem')
  @HttpCode(200)
  redeem(@Param('code', { schema: inviteCodeSchema }) code: string, @CurrentUser() user: AuthUser): KitchenView {
    return this.invites.redeem(code, user.id);
  }
}
