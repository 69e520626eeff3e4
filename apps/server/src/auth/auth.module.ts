import { Module } from '@nestjs/common';
import { APP_GUARD } from '@nestjs/core';
import { JwtModule } from '@nestjs/jwt';
import { ThrottlerModule } from '@nestjs/throttler';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { DemoModule } from '../demo/demo.module.js';
import { AuthController } from './auth.controller.js';
import { AuthGuard } from './auth.guard.js';
import { AuthService } from './auth.service.js';
import { resolveJwtSecret } from './jwt-secret.js';
import { SessionsRepository } from './sessions.repository.js';
import { TokensService } from './tokens.service.js';
import { UsersRepository } from './users.repository.js';

@Module({
  imports: [
    DemoModule,
    JwtModule.registerAsync({
      inject: [APP_CONFIG],
      useFactory: (config: AppConfig) => ({
        secret: resolveJwtSecret(config),
        signOptions: { issuer: 'jarday', audience: 'jarday' },
        verifyOptions: { issuer: 'jarday', audience: 'jarday' },
      }),
    }),
    ThrottlerModule.forRootAsync({
      inject: [APP_CONFIG],
      useFactory: (config: AppConfig) => [
        { ttl: config.SIGNIN_THROTTLE_TTL_SECONDS * 1000, limit: config.SIGNIN_THROTTLE_LIMIT },
      ],
    }),
  ],
  controllers: [AuthController],
  providers: [
    AuthService,
    TokensService,
    UsersRepository,
    SessionsRepository,
    { provide: APP_GUARD, useClass: AuthGuard },
  ],
  exports: [TokensService, UsersRepository],
})
export class AuthModule {}
