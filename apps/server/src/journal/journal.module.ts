import { Global, Module } from '@nestjs/common';
import { LivePublisher } from '../realtime/live-publisher.js';
import { CommandLedger } from './command-ledger.js';
import { JournalRepository } from './journal.repository.js';
import { JournalReviewModule } from './journal-review.module.js';

/** The journal and the publisher that fans its entries out: every domain that changes a day records through them. */
@Global()
@Module({
  imports: [JournalReviewModule],
  providers: [JournalRepository, LivePublisher, CommandLedger],
  exports: [JournalRepository, LivePublisher, CommandLedger],
})
export class JournalModule {}
