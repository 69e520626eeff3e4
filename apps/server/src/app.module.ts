import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { type DynamicModule, Logger, Module } from '@nestjs/common';
import { ServeStaticModule } from '@nestjs/serve-static';
import { AuthModule } from './auth/auth.module.js';
import { CannersModule } from './canners/canners.module.js';
import { ConfigModule } from './config/config.module.js';
import { validateConfig } from './config/config.schema.js';
import { DatabaseModule } from './db/database.module.js';
import { HealthModule } from './health/health.module.js';
import { InvitesModule } from './invites/invites.module.js';
import { DaysModule } from './days/days.module.js';
import { CoolingModule } from './cooling/cooling.module.js';
import { PantryModule } from './pantry/pantry.module.js';
import { PlannerModule } from './planner/planner.module.js';
import { JournalModule } from './journal/journal.module.js';
import { KitchensModule } from './kitchens/kitchens.module.js';
import { LiveModule } from './live/live.module.js';
import { MailModule } from './mail/mail.module.js';
import { RecipesModule } from './recipes/recipes.module.js';
import { RemindersModule } from './reminders/reminders.module.js';
import { LabelsModule } from './labels/labels.module.js';
import { UploadsModule } from './uploads/uploads.module.js';

/** apps/web/dist, the same depth from src/ and dist/. */
const DEFAULT_WEB_DIST = fileURLToPath(new URL('../../web/dist', import.meta.url));

@Module({})
export class AppModule {
  /** The whole app for one set of settings (main.ts passes process.env; tests pass their own). */
  static forRoot(env: Record<string, string | undefined>): DynamicModule {
    const config = validateConfig(env);
    const webDist = config.WEB_DIST_PATH ?? DEFAULT_WEB_DIST;
    const hasWeb = existsSync(`${webDist}/index.html`);
    if (!hasWeb && config.NODE_ENV !== 'test')
      new Logger('Web').warn(`No built web app at ${webDist}: run "npm run build:web" to serve it at /`);
    return {
      module: AppModule,
      imports: [
        ConfigModule.forRoot(env),
        DatabaseModule,
        MailModule,
        AuthModule,
        KitchensModule,
        InvitesModule,
        CannersModule,
        RecipesModule,
        JournalModule,
        DaysModule,
        CoolingModule,
        PantryModule,
        PlannerModule,
        LiveModule,
        HealthModule,
        RemindersModule,
        UploadsModule,
        LabelsModule,
        ...(hasWeb
          ? [
              ServeStaticModule.forRoot({
                rootPath: webDist,
                exclude: ['/api/{*path}', '/socket.io/{*path}'],
                serveStaticOptions: { index: 'index.html', maxAge: '1h' },
              }),
            ]
          : []),
      ],
    };
  }
}
