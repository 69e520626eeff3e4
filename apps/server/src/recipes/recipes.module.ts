import { Module } from '@nestjs/common';
import { CannersModule } from '../canners/canners.module.js';
import { KitchensModule } from '../kitchens/kitchens.module.js';
import { RecipesController } from './recipes.controller.js';
import { RecipesRepository } from './recipes.repository.js';
import { RecipesService } from './recipes.service.js';

@Module({
  imports: [KitchensModule, CannersModule],
  controllers: [RecipesController],
  providers: [RecipesService, RecipesRepository],
  exports: [RecipesService],
})
export class RecipesModule {}
