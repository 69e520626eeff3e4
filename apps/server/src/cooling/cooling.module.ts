import { Module } from '@nestjs/common';
import { CannersModule } from '../canners/canners.module.js';
import { DaysModule } from '../days/days.module.js';
import { KitchensModule } from '../kitchens/kitchens.module.js';
import { PantryModule } from '../pantry/pantry.module.js';
import { TimersModule } from '../timers/timers.module.js';
import { CoolingController } from './cooling.controller.js';
import { CoolingRepository } from './cooling.repository.js';
import { CoolingService } from './cooling.service.js';
import { ReprocessService } from './reprocess.service.js';
import { SealChecksService } from './seal-checks.service.js';

/** After the canner: the cooling shelf, the band gate, seal checks and reprocessing. */
@Module({
  imports: [KitchensModule, CannersModule, DaysModule, PantryModule, TimersModule],
  controllers: [CoolingController],
  providers: [CoolingService, CoolingRepository, SealChecksService, ReprocessService],
  exports: [CoolingService, CoolingRepository],
})
export class CoolingModule {}
