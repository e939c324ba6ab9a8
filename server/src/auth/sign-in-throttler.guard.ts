import { HttpStatus, Injectable } from '@nestjs/common';
import { ThrottlerGuard } from '@nestjs/throttler';
import { ApiException } from '../common/api-error';

/** Limits attempts per client address and e-mail, so one guesser cannot lock out a whole school. */
@Injectable()
export class SignInThrottlerGuard extends ThrottlerGuard {
  protected override async getTracker(req: Record<string, any>): Promise<string> {
    const email = typeof req.body?.email === 'string' ? req.body.email.trim().toLowerCase() : '';
    return `${req.ip}|${email}`;
  }

  protected override async throwThrottlingException(): Promise<void> {
    throw new ApiException(
      HttpStatus.TOO_MANY_REQUESTS,
      'rate_limited',
      'Too many attempts. Wait a few minutes before trying again, or reset your password.',
    );
  }
}
