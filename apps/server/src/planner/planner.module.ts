import { Module } from '@nestjs/common';
import { CannersModule } from '../canners/canners.module.js';
import { DaysModule } from '../days/days.module.js';
import { KitchensModule } from '../kitchens/kitchens.module.js';
import { RecipesModule } from '../recipes/recipes.module.js';
import { PlannerController } from './planner.controller.js';
import { PlannerRepository } from './planner.repository.js';
import { PlannerService } from './planner.service.js';

/** The Day planner: previews a day from recipes, batch sizes and canners, and opens it through the days service. */
@Module({
  imports: [KitchensModule, CannersModule, RecipesModule, DaysModule],
  controllers: [PlannerController],
  providers: [PlannerService, PlannerRepository],
})
export class PlannerModule {}
