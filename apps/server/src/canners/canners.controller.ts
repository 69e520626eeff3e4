import { type CannerView, createCannerSchema, idSchema, updateCannerSchema } from '@jarday/contracts';
import { Body, Controller, Delete, Get, HttpCode, Param, Post, Put } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { ApiZodBody } from '../common/openapi.js';
import { AnyMember, KitchenRoles } from '../kitchens/kitchen-role.guard.js';
import { type CannerInput, CannersService } from './canners.service.js';

@ApiTags('canners')
@ApiBearerAuth()
@Controller('kitchens/:kitchenId/canners')
export class CannersController {
  constructor(private readonly canners: CannersService) {}

  @Get()
  @AnyMember()
  list(@Param('kitchenId') kitchenId: string): CannerView[] {
    return this.canners.list(kitchenId);
  }

  @Post()
  @KitchenRoles('lead')
  @ApiZodBody(createCannerSchema)
  create(@Param('kitchenId') kitchenId: string, @Body({ schema: createCannerSchema }) body: CannerInput): CannerView {
    return this.canners.create(kitchenId, body);
  }

  @Put(':cannerId')
  @KitchenRoles('lead')
  @ApiZodBody(updateCannerSchema)
  replace(
    @Param('kitchenId') kitchenId: string,
    @Param('cannerId', { schema: idSchema }) cannerId: string,
    @Body({ schema: updateCannerSchema }) body: CannerInput,
  ): CannerView {
    return this.canners.replace(kitchenId, cannerId, body);
  }

  @Delete(':cannerId')
  @KitchenRoles('lead')
  @HttpCode(204)
  remove(@Param('kitchenId') kitchenId: string, @Param('cannerId', { schema: idSchema }) cannerId: string): void {
    this.canners.remove(kitchenId, cannerId);
  }
}
