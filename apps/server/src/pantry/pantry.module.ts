import { Module } from '@nestjs/common';
import { DaysModule } from '../days/days.module.js';
import { KitchensModule } from '../kitchens/kitchens.module.js';
import { PantryController } from './pantry.controller.js';
import { PantryRepository } from './pantry.repository.js';
import { PantryService } from './pantry.service.js';

/** Lots of sealed jars, where they are kept, and what left the shelf. The cooling shelf makes the lots. */
@Module({
  imports: [KitchensModule, DaysModule],
  controllers: [PantryController],
  providers: [PantryService, PantryRepository],
  exports: [PantryService, PantryRepository],
})
export class PantryModule {}
