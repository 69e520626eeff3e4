import { Module } from '@nestjs/common';
import { TimerScheduler } from './timer-scheduler.js';
import { TimersRepository } from './timers.repository.js';
import { TimersService } from './timers.service.js';

@Module({ providers: [TimersService, TimersRepository, TimerScheduler], exports: [TimersService] })
export class TimersModule {}
