import { type DemoAccount, registerSchema, type SessionView, signInSchema, type UserView } from '@jarday/contracts';
import type { RegisterInput, SignInInput } from '@jarday/contracts';
import { Body, Controller, Get, HttpCode, Post, Req, Res, UseGuards } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { Request, Response } from 'express';
import { ApiZodBody } from '../common/openapi.js';
import { DemoService } from '../demo/demo.service.js';
import { type AuthUser, CurrentUser, Public } from './auth.decorators.js';
import { AuthService, type IssuedSession } from './auth.service.js';
import { SignInThrottlerGuard } from './sign-in-throttler.guard.js';

export const REFRESH_COOKIE = 'jarday_refresh';
const COOKIE_PATH = '/api/auth';

function readRefreshCookie(req: Request): string | undefined {
  const cookies: unknown = (req as { cookies?: unknown }).cookies;
  const value: unknown =
    typeof cookies === 'object' && cookies !== null ? (cookies as Record<string, unknown>)[REFRESH_COOKIE] : undefined;
  return typeof value === 'string' && value.length > 0 && value.length < 200 ? value : undefined;
}

function sendSession(req: Request, res: Response, session: IssuedSession): SessionView {
  res.cookie(REFRESH_COOKIE, session.refreshToken, {
    httpOnly: true,
    sameSite: 'strict',
    secure: req.secure,
    path: COOKIE_PATH,
    expires: session.refreshExpiresAt,
  });
  return session.view;
}

@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(
    private readonly auth: AuthService,
    private readonly demo: DemoService,
  ) {}

  @Public()
  @UseGuards(SignInThrottlerGuard)
  @Post('register')
  @ApiZodBody(registerSchema)
  async register(
    @Body({ schema: registerSchema }) body: RegisterInput,
    @Req() req: Request,
    @Res({ passthrough: true }) res: Response,
  ): Promise<SessionView> {
    return sendSession(req, res, await this.auth.register(body, req.get('user-agent')));
  }

  @Public()
  @UseGuards(SignInThrottlerGuard)
  @Post('sign-in')
  @HttpCode(200)
  @ApiZodBody(signInSchema)
  async signIn(
    @Body({ schema: signInSchema }) body: SignInInput,
    @Req() req: Request,
    @Res({ passthrough: true }) res: Response,
  ): Promise<SessionView> {
    return sendSession(req, res, await this.auth.signIn(body, req.get('user-agent')));
  }

  @Public()
  @Post('refresh')
  @HttpCode(200)
  async refresh(@Req() req: Request, @Res({ passthrough: true }) res: Response): Promise<SessionView> {
    return sendSession(req, res, await this.auth.refresh(readRefreshCookie(req)));
  }

  @Public()
  @Post('sign-out')
  @HttpCode(204)
  signOut(@Req() req: Request, @Res({ passthrough: true }) res: Response): void {
    this.auth.signOut(readRefreshCookie(req));
    res.clearCookie(REFRESH_COOKIE, { path: COOKIE_PATH });
  }

  @Get('me')
  me(@CurrentUser() user: AuthUser): UserView {
    return this.auth.me(user);
  }

  @Public()
  @Get('demo-accounts')
  demoAccounts(): { demoMode: boolean; accounts: DemoAccount[] } {
    return this.demo.accounts();
  }
}
