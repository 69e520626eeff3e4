import { Module } from '@nestjs/common';
import { KitchensModule } from '../kitchens/kitchens.module.js';
import { CannersController } from './canners.controller.js';
import { CannersRepository } from './canners.repository.js';
import { CannersService } from './canners.service.js';

@Module({
  imports: [KitchensModule],
  controllers: [CannersController],
  providers: [CannersService, CannersRepository],
  exports: [CannersService, CannersRepository],
})
export class CannersModule {}
