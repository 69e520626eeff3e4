import { Module } from '@nestjs/common';
import { KitchensModule } from '../kitchens/kitchens.module.js';
import { JournalReviewController } from './journal-review.controller.js';
import { JournalReviewRepository } from './journal-review.repository.js';
import { JournalReviewService } from './journal-review.service.js';

/** The Journal's review routes: reading, summarising and exporting a day; the kitchen guard needs KitchensModule. */
@Module({
  imports: [KitchensModule],
  controllers: [JournalReviewController],
  providers: [JournalReviewService, JournalReviewRepository],
})
export class JournalReviewModule {}
