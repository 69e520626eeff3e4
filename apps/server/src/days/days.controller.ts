import {
  type BatchView,
  createBatchSchema,
  createDaySchema,
  createLoadSchema,
  type DaySummaryView,
  type DayView,
  idSchema,
  listDaysQuerySchema,
  type LoadView,
} from '@jarday/contracts';
import { Body, Controller, Get, Headers, HttpCode, Param, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { z } from 'zod';
import { type AuthUser, CurrentUser } from '../auth/auth.decorators.js';
import { ApiZodBody } from '../common/openapi.js';
import { AnyMember, CurrentMembership, KitchenRoles } from '../kitchens/kitchen-role.guard.js';
import type { MembershipRow } from '../kitchens/kitchens.repository.js';
import { actorOf } from './actor.js';
import { DaysService } from './days.service.js';

@ApiTags('days')
@ApiBearerAuth()
@Controller('kitchens/:kitchenId/days')
export class DaysController {
  constructor(private readonly days: DaysService) {}

  @Get()
  @AnyMember()
  list(
    @Param('kitchenId') kitchenId: string,
    @Query({ schema: listDaysQuerySchema }) query: z.output<typeof listDaysQuerySchema>,
  ): DaySummaryView[] {
    return this.days.list(kitchenId, query.status, query.limit);
  }

  @Post()
  @KitchenRoles('lead')
  @ApiZodBody(createDaySchema)
  create(
    @Param('kitchenId') kitchenId: string,
    @CurrentUser() user: AuthUser,
    @CurrentMembership() member: MembershipRow,
    @Headers('x-device-id') device: string | undefined,
    @Body({ schema: createDaySchema }) body: z.output<typeof createDaySchema>,
  ): DayView {
    return this.days.create(kitchenId, body, actorOf(user, member, device));
  }

  @Get(':dayId')
  @AnyMember()
  get(@Param('kitchenId') kitchenId: string, @Param('dayId', { schema: idSchema }) dayId: string): DayView {
    return this.days.get(kitchenId, dayId);
  }

  @Post(':dayId/close')
  @KitchenRoles('lead')
  @HttpCode(200)
  close(
    @Param('kitchenId') kitchenId: string,
    @Param('dayId', { schema: idSchema }) dayId: string,
    @CurrentUser() user: AuthUser,
    @CurrentMembership() member: MembershipRow,
    @Headers('x-device-id') device: string | undefined,
  ): DayView {
    return this.days.close(kitchenId, dayId, actorOf(user, member, device));
  }

  @Post(':dayId/batches')
  @KitchenRoles('lead')
  @ApiZodBody(createBatchSchema)
  addBatch(
    @Param('kitchenId') kitchenId: string,
    @Param('dayId', { schema: idSchema }) dayId: string,
    @CurrentUser() user: AuthUser,
    @CurrentMembership() member: MembershipRow,
    @Headers('x-device-id') device: string | undefined,
    @Body({ schema: createBatchSchema }) body: z.output<typeof createBatchSchema>,
  ): BatchView {
    return this.days.addBatch(kitchenId, dayId, body, actorOf(user, member, device));
  }

  @Post(':dayId/loads')
  @KitchenRoles('lead', 'helper')
  @ApiZodBody(createLoadSchema)
  addLoad(
    @Param('kitchenId') kitchenId: string,
    @Param('dayId', { schema: idSchema }) dayId: string,
    @CurrentUser() user: AuthUser,
    @CurrentMembership() member: MembershipRow,
    @Headers('x-device-id') device: string | undefined,
    @Body({ schema: createLoadSchema }) body: z.output<typeof createLoadSchema>,
  ): LoadView {
    return this.days.addLoad(kitchenId, dayId, body, actorOf(user, member, device));
  }
}
