import { HttpStatus, Injectable } from '@nestjs/common';
import { ThrottlerGuard } from '@nestjs/throttler';
import { ApiException } from '../common/api-error';

/** Limits attempts per client address and e-mail, so one guesser cannot lock out a whole school. */
@Injectable()
export class SignInThrottlerGuard extends ThrottlerGuard {
  protected override async getTracker(req: Record<string, any>): Promise<string> {
    // Sign-in and reset requests are keyed by e-mail, link redemptions by their token.
    const body = req.body ?? {};
    const subject = typeof body.email === 'string' ? body.email.trim().toLowerCase() : typeof body.token === 'string' ? body.token : '';
    return `${req.ip}|${subject}`;
  }

  protected override async throwThrottlingException(): Promise<void> {
    throw new ApiException(
      HttpStatus.TOO_MANY_REQUESTS,
      'rate_limited',
      'Too many attempts. Wait a few minutes before trying again, or reset your password.',
    );
  }
}
