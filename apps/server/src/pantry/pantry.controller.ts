import {
  createLotEntrySchema,
  idSchema,
  type LotEntryAnswer,
  lotsQuerySchema,
  type LotView,
  type PantrySummaryView,
  updateLotSchema,
} from '@jarday/contracts';
import { Body, Controller, Get, Param, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { z } from 'zod';
import { type AuthUser, CurrentUser } from '../auth/auth.decorators.js';
import { ApiZodBody } from '../common/openapi.js';
import { AnyMember, KitchenRoles } from '../kitchens/kitchen-role.guard.js';
import { PantryService } from './pantry.service.js';

@ApiTags('pantry')
@ApiBearerAuth()
@Controller('kitchens/:kitchenId')
export class PantryController {
  constructor(private readonly pantry: PantryService) {}

  @Get('pantry')
  @AnyMember()
  summary(@Param('kitchenId') kitchenId: string): PantrySummaryView {
    return this.pantry.summary(kitchenId);
  }

  @Get('lots')
  @AnyMember()
  list(
    @Param('kitchenId') kitchenId: string,
    @Query({ schema: lotsQuerySchema }) query: z.output<typeof lotsQuerySchema>,
  ): LotView[] {
    return this.pantry.list(kitchenId, query.dayId);
  }

  @Get('lots/:lotId')
  @AnyMember()
  get(@Param('kitchenId') kitchenId: string, @Param('lotId', { schema: idSchema }) lotId: string): LotView {
    return this.pantry.get(kitchenId, lotId);
  }

  @Patch('lots/:lotId')
  @KitchenRoles('lead', 'helper')
  @ApiZodBody(updateLotSchema)
  update(
    @Param('kitchenId') kitchenId: string,
    @Param('lotId', { schema: idSchema }) lotId: string,
    @Body({ schema: updateLotSchema }) body: z.output<typeof updateLotSchema>,
  ): LotView {
    return this.pantry.update(kitchenId, lotId, body);
  }

  @Post('lots/:lotId/entries')
  @KitchenRoles('lead', 'helper')
  @ApiZodBody(createLotEntrySchema)
  addEntry(
    @Param('kitchenId') kitchenId: string,
    @Param('lotId', { schema: idSchema }) lotId: string,
    @CurrentUser() user: AuthUser,
    @Body({ schema: createLotEntrySchema }) body: z.output<typeof createLotEntrySchema>,
  ): LotEntryAnswer {
    return this.pantry.addEntry(kitchenId, lotId, body, { userId: user.id, name: user.name });
  }
}
