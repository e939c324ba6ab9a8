import { CanActivate, ExecutionContext, HttpStatus, Inject, Injectable } from '@nestjs/common';
import { ApiException } from '../common/api-error';
import { PLAY_RATE_LIMIT, type PlayRateLimit } from './sessions.constants';

interface Window {
  startedAt: number;
  requests: number;
  failures: number;
}

const TOO_MANY = () =>
  new ApiException(HttpStatus.TOO_MANY_REQUESTS, 'rate_limited', 'Too many attempts from this device. Wait a minute, then check the code on the board.');

/**
 * Join-code guessing is limited per client address: a fixed window counts
 * every request (generously: a class behind one school address joins at
 * once) and, tightly, the failed code look-ups.
 */
@Injectable()
export class JoinAttemptLimiter {
  private readonly windows = new Map<string, Window>();

  constructor(@Inject(PLAY_RATE_LIMIT) private readonly limit: PlayRateLimit) {}

  private window(key: string): Window {
    const now = Date.now();
    let w = this.windows.get(key);
    if (!w || now - w.startedAt >= this.limit.windowMs) {
      w = { startedAt: now, requests: 0, failures: 0 };
      this.windows.set(key, w);
      if (this.windows.size > 50_000) this.prune(now);
    }
    return w;
  }

  /** Counts a request; throws 429 when the address is over either limit. */
  check(key: string): void {
    const w = this.window(key);
    w.requests++;
    if (w.requests > this.limit.requests || w.failures >= this.limit.failures) throw TOO_MANY();
  }

  recordFailure(key: string): void {
    this.window(key).failures++;
  }

  reset(): void {
    this.windows.clear();
  }

  private prune(now: number): void {
    for (const [k, w] of this.windows) if (now - w.startedAt >= this.limit.windowMs) this.windows.delete(k);
  }
}

@Injectable()
export class JoinRateLimitGuard implements CanActivate {
  constructor(private readonly limiter: JoinAttemptLimiter) {}

  canActivate(ctx: ExecutionContext): boolean {
    const req = ctx.switchToHttp().getRequest<{ ip?: string }>();
    this.limiter.check(req.ip ?? 'unknown');
    return true;
  }
}
