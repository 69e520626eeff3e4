import { Module } from '@nestjs/common';
import { DaySummaryMailer } from './day-summary.mailer.js';
import { RemindersRepository } from './reminders.repository.js';
import { RemindersService } from './reminders.service.js';

/** Mail that follows the kitchen's data: reminders about cooling loads, and the record of a closed day. */
@Module({ providers: [RemindersService, RemindersRepository, DaySummaryMailer], exports: [RemindersService] })
export class RemindersModule {}
