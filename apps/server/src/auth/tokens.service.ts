import { createHash, randomBytes } from 'node:crypto';
import { Inject, Injectable } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import type { AuthUser } from './auth.decorators.js';

interface AccessClaims {
  sub: string;
  email: string;
  name: string;
  typ: 'access';
}

/** Short-lived access tokens (JWT) and opaque refresh tokens that are stored only as hashes. */
@Injectable()
export class TokensService {
  constructor(
    private readonly jwt: JwtService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  async issueAccess(user: AuthUser, now: Date): Promise<{ token: string; expiresAt: Date }> {
    const ttl = this.config.ACCESS_TOKEN_TTL_SECONDS;
    const claims: AccessClaims = { sub: user.id, email: user.email, name: user.name, typ: 'access' };
    const token = await this.jwt.signAsync(claims, { expiresIn: ttl });
    return { token, expiresAt: new Date(Math.floor(now.getTime() / 1000) * 1000 + ttl * 1000) };
  }

  /** Returns the user the token names, or undefined for an expired, forged or wrong-kind token. */
  async verifyAccess(token: string): Promise<AuthUser | undefined> {
    return (await this.verifyAccessUntil(token))?.user;
  }

  /** The user and the moment (epoch ms) the token stops working, for connections that outlive a request. */
  async verifyAccessUntil(token: string): Promise<{ user: AuthUser; expiresAt: number } | undefined> {
    try {
      const claims = await this.jwt.verifyAsync<AccessClaims & { exp: number }>(token);
      if (claims.typ !== 'access' || typeof claims.sub !== 'string') return undefined;
      return { user: { id: claims.sub, email: claims.email, name: claims.name }, expiresAt: claims.exp * 1000 };
    } catch {
      return undefined;
    }
  }

  newRefreshToken(): string {
    return randomBytes(32).toString('base64url');
  }

  hashRefreshToken(token: string): string {
    return createHash('sha256').update(token).digest('hex');
  }

  refreshExpiry(now: Date): Date {
    return new Date(now.getTime() + this.config.REFRESH_TOKEN_TTL_DAYS * 86_400_000);
  }
}
