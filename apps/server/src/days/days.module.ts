import { Module } from '@nestjs/common';
import { CannersModule } from '../canners/canners.module.js';
import { JournalModule } from '../journal/journal.module.js';
import { KitchensModule } from '../kitchens/kitchens.module.js';
import { RecipesModule } from '../recipes/recipes.module.js';
import { TimersModule } from '../timers/timers.module.js';
import { DaysController } from './days.controller.js';
import { DaysRepository } from './days.repository.js';
import { DaysService } from './days.service.js';
import { StepsRepository } from './steps.repository.js';

@Module({
  imports: [KitchensModule, CannersModule, RecipesModule, JournalModule, TimersModule],
  controllers: [DaysController],
  providers: [DaysService, DaysRepository, StepsRepository],
  exports: [DaysService, DaysRepository, StepsRepository],
})
export class DaysModule {}
