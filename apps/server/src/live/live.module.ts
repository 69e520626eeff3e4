import { Module } from '@nestjs/common';
import { AuthModule } from '../auth/auth.module.js';
import { DaysModule } from '../days/days.module.js';
import { KitchensModule } from '../kitchens/kitchens.module.js';
import { TimersModule } from '../timers/timers.module.js';
import { LiveDaysService } from './live-days.service.js';
import { LiveGateway } from './live.gateway.js';

@Module({
  imports: [AuthModule, DaysModule, KitchensModule, TimersModule],
  providers: [LiveGateway, LiveDaysService],
})
export class LiveModule {}
