import {
  type DayView,
  deviceIdSchema,
  type PlanPreviewAnswer,
  planRequestSchema,
  startPlanSchema,
} from '@jarday/contracts';
import { Body, Controller, Headers, HttpCode, Param, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { z } from 'zod';
import { type AuthUser, CurrentUser } from '../auth/auth.decorators.js';
import { ApiZodBody } from '../common/openapi.js';
import type { Actor } from '../days/days.service.js';
import { AnyMember, CurrentMembership, KitchenRoles } from '../kitchens/kitchen-role.guard.js';
import type { MembershipRow } from '../kitchens/kitchens.repository.js';
import { PlannerService } from './planner.service.js';

const actorOf = (user: AuthUser, member: MembershipRow, device: string | undefined): Actor => ({
  userId: user.id,
  name: user.name,
  role: member.role,
  deviceId: deviceIdSchema.safeParse(device).data ?? null,
});

@ApiTags('planner')
@ApiBearerAuth()
@Controller('kitchens/:kitchenId/plans')
export class PlannerController {
  constructor(private readonly planner: PlannerService) {}

  /** A plan to look at: anyone in the kitchen may see what a day would take. Nothing is stored. */
  @Post('preview')
  @AnyMember()
  @HttpCode(200)
  @ApiZodBody(planRequestSchema)
  preview(
    @Param('kitchenId') kitchenId: string,
    @Body({ schema: planRequestSchema }) body: z.output<typeof planRequestSchema>,
  ): PlanPreviewAnswer {
    return this.planner.preview(kitchenId, body);
  }

  /** Opens the planned day with its batches and loads (a lead starts days). */
  @Post('start')
  @KitchenRoles('lead')
  @ApiZodBody(startPlanSchema)
  start(
    @Param('kitchenId') kitchenId: string,
    @CurrentUser() user: AuthUser,
    @CurrentMembership() member: MembershipRow,
    @Headers('x-device-id') device: string | undefined,
    @Body({ schema: startPlanSchema }) body: z.output<typeof startPlanSchema>,
  ): DayView {
    return this.planner.start(kitchenId, body, actorOf(user, member, device));
  }
}
