import { Module } from '@nestjs/common';
import { KitchenRoleGuard } from './kitchen-role.guard.js';
import { KitchensController } from './kitchens.controller.js';
import { KitchensRepository } from './kitchens.repository.js';
import { KitchensService } from './kitchens.service.js';

@Module({
  controllers: [KitchensController],
  providers: [KitchensService, KitchensRepository, KitchenRoleGuard],
  exports: [KitchensService, KitchensRepository, KitchenRoleGuard],
})
export class KitchensModule {}
