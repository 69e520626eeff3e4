import type { HealthView } from '@jarday/contracts';
import { Controller, Get, Inject, Res } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { Public } from '../auth/auth.decorators.js';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import type { Db } from '../db/database.js';
import { InjectDb } from '../db/database.module.js';

export const APP_VERSION = '0.1.0';

@ApiTags('health')
@Controller('health')
export class HealthController {
  constructor(
    @InjectDb() private readonly db: Db,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  /** 200 when the database answers, 503 when it does not: load balancers and the CI script read this. */
  @Public()
  @Get()
  health(@Res({ passthrough: true }) res: Response): HealthView {
    let database: HealthView['database'] = 'up';
    try {
      this.db.$client.prepare('select 1').get();
    } catch {
      database = 'down';
    }
    if (database === 'down') res.status(503);
    return {
      status: database === 'up' ? 'ok' : 'degraded',
      database,
      version: APP_VERSION,
      time: new Date().toISOString(),
      demoMode: this.config.DEMO_MODE,
    };
  }
}
