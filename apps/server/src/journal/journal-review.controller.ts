import {
  type DayReviewView,
  idSchema,
  type JournalQuery,
  journalQuerySchema,
  type JournalView,
  type PastDayView,
  pastDaysQuerySchema,
  type YesterdayView,
} from '@jarday/contracts';
import { Controller, Get, Header, Param, Query, StreamableFile } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { z } from 'zod';
import { AnyMember } from '../kitchens/kitchen-role.guard.js';
import { JournalReviewService } from './journal-review.service.js';

const attachment = (name: string) => `attachment; filename="${name}"`;

/** The Journal: any member (watchers included) may read and export a day of their kitchen. */
@ApiTags('journal')
@ApiBearerAuth()
@Controller('kitchens/:kitchenId')
export class JournalReviewController {
  constructor(private readonly review: JournalReviewService) {}

  @Get('journal/days')
  @AnyMember()
  pastDays(
    @Param('kitchenId') kitchenId: string,
    @Query({ schema: pastDaysQuerySchema }) query: z.output<typeof pastDaysQuerySchema>,
  ): PastDayView[] {
    return this.review.pastDays(kitchenId, query.limit);
  }

  @Get('journal/yesterday')
  @AnyMember()
  yesterday(@Param('kitchenId') kitchenId: string): YesterdayView {
    return this.review.yesterday(kitchenId);
  }

  @Get('days/:dayId/journal')
  @AnyMember()
  journal(
    @Param('kitchenId') kitchenId: string,
    @Param('dayId', { schema: idSchema }) dayId: string,
    @Query({ schema: journalQuerySchema }) query: JournalQuery,
  ): JournalView {
    return this.review.journal(kitchenId, dayId, query);
  }

  @Get('days/:dayId/summary')
  @AnyMember()
  summary(@Param('kitchenId') kitchenId: string, @Param('dayId', { schema: idSchema }) dayId: string): DayReviewView {
    return this.review.review(kitchenId, dayId);
  }

  @Get('days/:dayId/journal.csv')
  @AnyMember()
  @Header('Content-Type', 'text/csv; charset=utf-8')
  csv(
    @Param('kitchenId') kitchenId: string,
    @Param('dayId', { schema: idSchema }) dayId: string,
    @Query({ schema: journalQuerySchema }) query: JournalQuery,
  ): StreamableFile {
    const { name, body } = this.review.csv(kitchenId, dayId, query);
    return new StreamableFile(Buffer.from(body, 'utf8'), { disposition: attachment(name) });
  }

  @Get('days/:dayId/record.pdf')
  @AnyMember()
  @Header('Content-Type', 'application/pdf')
  async pdf(
    @Param('kitchenId') kitchenId: string,
    @Param('dayId', { schema: idSchema }) dayId: string,
  ): Promise<StreamableFile> {
    const { name, body } = await this.review.pdf(kitchenId, dayId);
    return new StreamableFile(body, { disposition: attachment(name) });
  }
}
