import { type DynamicModule, Global, Module } from '@nestjs/common';
import { APP_CONFIG } from './app-config.js';
import { validateConfig } from './config.schema.js';

/**
 * Validated settings as one injectable object. The environment is passed in by main.ts (and by tests),
 * so nothing else reads process.env and each test app gets its own settings.
 */
@Global()
@Module({})
export class ConfigModule {
  static forRoot(env: Record<string, string | undefined>): DynamicModule {
    const config = validateConfig(env);
    return { module: ConfigModule, providers: [{ provide: APP_CONFIG, useValue: config }], exports: [APP_CONFIG] };
  }
}
