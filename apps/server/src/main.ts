import 'reflect-metadata';
import { Logger } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { AppModule } from './app.module.js';
import { configureApp } from './app.setup.js';
import { APP_CONFIG, type AppConfig } from './config/app-config.js';
import { ConfigError } from './config/config.schema.js';

async function bootstrap(): Promise<void> {
  const app = await NestFactory.create<NestExpressApplication>(AppModule.forRoot(process.env), { bodyParser: false });
  configureApp(app);
  const config = app.get<AppConfig>(APP_CONFIG);
  await app.listen(config.PORT, config.HOST);
  new Logger('Jarday').log(`Listening on http://localhost:${config.PORT} (API at /api, docs at /api/docs)`);
}

bootstrap().catch((error: unknown) => {
  // A bad setting is a sentence for a person, not a stack trace.
  if (error instanceof ConfigError) console.error(error.message);
  else console.error(error);
  process.exit(1);
});
