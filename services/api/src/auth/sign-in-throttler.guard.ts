import { Injectable, type ExecutionContext } from '@nestjs/common';
import { ThrottlerException, ThrottlerGuard } from '@nestjs/throttler';

/**
 * Limits sign-in and reset requests per address and e-mail (so a shared office address does not
 * block everyone). The store is in memory: several API processes each keep their own count, and
 * the account lock-out in the database still holds across them.
 */
@Injectable()
export class SignInThrottlerGuard extends ThrottlerGuard {
  protected override getTracker(req: Record<string, unknown>): Promise<string> {
    const body = (req.body ?? {}) as { email?: unknown };
    const email = typeof body.email === 'string' ? body.email.trim().toLowerCase() : '';
    return Promise.resolve(`${String(req.ip)}|${email}`);
  }

  protected override throwThrottlingException(_context: ExecutionContext): Promise<void> {
    throw new ThrottlerException(
      'Too many attempts in a short time. Wait a minute, then try again.',
    );
  }
}
