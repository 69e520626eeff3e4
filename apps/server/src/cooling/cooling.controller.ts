import {
  bandsOffSchema,
  type CoolingLoadView,
  coolingQuerySchema,
  type CoolingShelfView,
  idSchema,
  type ReprocessAnswer,
  reprocessSchema,
  sealCheckSchema,
} from '@jarday/contracts';
import { Body, Controller, Get, Headers, HttpCode, Param, Post, Put, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { z } from 'zod';
import { type AuthUser, CurrentUser } from '../auth/auth.decorators.js';
import { ApiZodBody } from '../common/openapi.js';
import { actorOf } from '../days/actor.js';
import { AnyMember, CurrentMembership, KitchenRoles } from '../kitchens/kitchen-role.guard.js';
import type { MembershipRow } from '../kitchens/kitchens.repository.js';
import { CoolingService } from './cooling.service.js';
import { ReprocessService } from './reprocess.service.js';
import { SealChecksService } from './seal-checks.service.js';

@ApiTags('cooling')
@ApiBearerAuth()
@Controller('kitchens/:kitchenId')
export class CoolingController {
  constructor(
    private readonly cooling: CoolingService,
    private readonly seals: SealChecksService,
    private readonly reprocessing: ReprocessService,
  ) {}

  @Get('cooling')
  @AnyMember()
  shelf(
    @Param('kitchenId') kitchenId: string,
    @Query({ schema: coolingQuerySchema }) query: z.output<typeof coolingQuerySchema>,
  ): CoolingShelfView {
    return this.cooling.shelf(kitchenId, query.dayId);
  }

  @Post('loads/:loadId/bands-off')
  @KitchenRoles('lead', 'helper')
  @HttpCode(200)
  @ApiZodBody(bandsOffSchema)
  bandsOff(
    @Param('kitchenId') kitchenId: string,
    @Param('loadId', { schema: idSchema }) loadId: string,
    @CurrentUser() user: AuthUser,
    @CurrentMembership() member: MembershipRow,
    @Headers('x-device-id') device: string | undefined,
    @Body({ schema: bandsOffSchema }) body: z.output<typeof bandsOffSchema>,
  ): CoolingLoadView {
    return this.cooling.bandsOff(kitchenId, loadId, body, actorOf(user, member, device));
  }

  @Put('loads/:loadId/seal-checks')
  @KitchenRoles('lead', 'helper')
  @ApiZodBody(sealCheckSchema)
  checkSeals(
    @Param('kitchenId') kitchenId: string,
    @Param('loadId', { schema: idSchema }) loadId: string,
    @CurrentUser() user: AuthUser,
    @CurrentMembership() member: MembershipRow,
    @Headers('x-device-id') device: string | undefined,
    @Body({ schema: sealCheckSchema }) body: z.output<typeof sealCheckSchema>,
  ): CoolingLoadView {
    return this.seals.check(kitchenId, loadId, body, actorOf(user, member, device));
  }

  @Post('loads/:loadId/reprocess')
  @KitchenRoles('lead', 'helper')
  @ApiZodBody(reprocessSchema)
  reprocess(
    @Param('kitchenId') kitchenId: string,
    @Param('loadId', { schema: idSchema }) loadId: string,
    @CurrentUser() user: AuthUser,
    @CurrentMembership() member: MembershipRow,
    @Headers('x-device-id') device: string | undefined,
    @Body({ schema: reprocessSchema }) body: z.output<typeof reprocessSchema>,
  ): ReprocessAnswer {
    return this.reprocessing.reprocess(kitchenId, loadId, body, actorOf(user, member, device));
  }
}
