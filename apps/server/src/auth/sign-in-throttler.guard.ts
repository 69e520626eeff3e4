import { Injectable } from '@nestjs/common';
import { ThrottlerGuard } from '@nestjs/throttler';

interface ThrottledRequest {
  ip?: string;
  body?: { email?: unknown };
}

/**
 * Throttles sign-in by address and e-mail together: one kitchen's tablets share an address,
 * and guessing at one account must not lock its neighbours out.
 */
@Injectable()
export class SignInThrottlerGuard extends ThrottlerGuard {
  protected override getTracker(req: ThrottledRequest): Promise<string> {
    const email = typeof req.body?.email === 'string' ? req.body.email.trim().toLowerCase().slice(0, 254) : '';
    return Promise.resolve(`${req.ip ?? 'unknown'}|${email}`);
  }
}
