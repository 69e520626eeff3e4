import { randomUUID } from 'node:crypto';
import type { RegisterInput, SessionView, SignInInput, UserView } from '@jarday/contracts';
import { Injectable } from '@nestjs/common';
import { AppError } from '../common/app-error.js';
import type { AuthUser } from './auth.decorators.js';
import { decoyHash, hashPassword, verifyPassword } from './passwords.js';
import { SessionsRepository } from './sessions.repository.js';
import { TokensService } from './tokens.service.js';
import { type UserRow, UsersRepository } from './users.repository.js';

/** A session answer plus the refresh token, which the controller puts in an httpOnly cookie. */
export interface IssuedSession {
  view: SessionView;
  refreshToken: string;
  refreshExpiresAt: Date;
}

export const toUserView = (u: UserRow): UserView => ({
  id: u.id,
  email: u.email,
  name: u.name,
  createdAt: u.createdAt.toISOString(),
});

const wrongCredentials = () => new AppError('invalid_credentials', 'E-mail or password is incorrect');

@Injectable()
export class AuthService {
  constructor(
    private readonly users: UsersRepository,
    private readonly sessions: SessionsRepository,
    private readonly tokens: TokensService,
  ) {}

  async register(input: RegisterInput, userAgent: string | undefined, now = new Date()): Promise<IssuedSession> {
    const row: UserRow = {
      id: randomUUID(),
      email: input.email,
      name: input.name,
      passwordHash: await hashPassword(input.password),
      createdAt: now,
    };
    if (!this.users.insert(row)) {
      throw new AppError('email_taken', 'An account with this e-mail already exists', [
        { path: 'email', message: 'An account with this e-mail already exists' },
      ]);
    }
    return this.openSession(row, userAgent, now);
  }

  async signIn(input: SignInInput, userAgent: string | undefined, now = new Date()): Promise<IssuedSession> {
    const user = this.users.findByEmail(input.email);
    // Verify against a decoy when the e-mail is unknown so timing does not tell which part was wrong.
    const ok = await verifyPassword(input.password, user?.passwordHash ?? (await decoyHash()));
    if (!user || !ok) throw wrongCredentials();
    return this.openSession(user, userAgent, now);
  }

  /** Rotates the refresh token: each one works once, so a stolen copy dies at the owner's next refresh. */
  async refresh(refreshToken: string | undefined, now = new Date()): Promise<IssuedSession> {
    const expired = new AppError('session_expired', 'Your session has ended. Please sign in again.');
    if (!refreshToken) throw expired;
    const oldHash = this.tokens.hashRefreshToken(refreshToken);
    const session = this.sessions.findLive(oldHash, now);
    const user = session && this.users.findById(session.userId);
    if (!session || !user) throw expired;
    const next = this.tokens.newRefreshToken();
    const refreshExpiresAt = this.tokens.refreshExpiry(now);
    if (!this.sessions.rotate(session.id, oldHash, this.tokens.hashRefreshToken(next), now, refreshExpiresAt)) {
      throw expired;
    }
    return { view: await this.sessionView(user, now), refreshToken: next, refreshExpiresAt };
  }

  signOut(refreshToken: string | undefined, now = new Date()): void {
    if (refreshToken) this.sessions.revokeByHash(this.tokens.hashRefreshToken(refreshToken), now);
  }

  me(user: AuthUser): UserView {
    const row = this.users.findById(user.id);
    if (!row) throw new AppError('unauthorized', 'Please sign in');
    return toUserView(row);
  }

  private async openSession(user: UserRow, userAgent: string | undefined, now: Date): Promise<IssuedSession> {
    const refreshToken = this.tokens.newRefreshToken();
    const refreshExpiresAt = this.tokens.refreshExpiry(now);
    this.sessions.insert({
      id: randomUUID(),
      userId: user.id,
      tokenHash: this.tokens.hashRefreshToken(refreshToken),
      userAgent: userAgent?.slice(0, 300) ?? null,
      createdAt: now,
      lastUsedAt: now,
      expiresAt: refreshExpiresAt,
      revokedAt: null,
    });
    return { view: await this.sessionView(user, now), refreshToken, refreshExpiresAt };
  }

  private async sessionView(user: UserRow, now: Date): Promise<SessionView> {
    const access = await this.tokens.issueAccess({ id: user.id, email: user.email, name: user.name }, now);
    return { user: toUserView(user), accessToken: access.token, accessTokenExpiresAt: access.expiresAt.toISOString() };
  }
}
