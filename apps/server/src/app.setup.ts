import type { INestApplication } from '@nestjs/common';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import cookieParser from 'cookie-parser';
import { AllExceptionsFilter } from './common/all-exceptions.filter.js';
import { createValidationPipe } from './common/validation.js';
import { APP_CONFIG, type AppConfig } from './config/app-config.js';
import { APP_VERSION } from './health/health.controller.js';

/** Everything main.ts and the e2e tests share, so tests run the app exactly as it ships. */
export function configureApp(app: NestExpressApplication): INestApplication {
  const config = app.get<AppConfig>(APP_CONFIG);
  app.set('trust proxy', 'loopback');
  app.useBodyParser('json', { limit: config.BODY_LIMIT_BYTES });
  app.use(cookieParser());
  app.setGlobalPrefix('api');
  app.useGlobalFilters(new AllExceptionsFilter());
  app.useGlobalPipes(createValidationPipe());
  app.enableShutdownHooks();

  const document = SwaggerModule.createDocument(
    app,
    new DocumentBuilder()
      .setTitle('Jarday API')
      .setDescription('Kitchens, members, canners and sign-in for Jarday, the shared timer board of a canning day.')
      .setVersion(APP_VERSION)
      .addBearerAuth()
      .build(),
  );
  SwaggerModule.setup('api/docs', app, document, { jsonDocumentUrl: 'api/docs-json' });
  return app;
}
