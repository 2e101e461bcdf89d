import { Inject, Injectable } from '@nestjs/common';
import { APP_CONFIG, type AppConfig } from '../../config/app-config.js';

const WINDOW_MS = 60_000;

/**
 * Counts failed sign-ins per account in a sliding minute. Keyed by account, not by address, so a rotating
 * X-Forwarded-For does not help an attacker and no other account is locked out.
 */
@Injectable()
export class SignInLimiter {
  private readonly failures = new Map<string, number[]>();

  constructor(@Inject(APP_CONFIG) private readonly config: AppConfig) {}

  /** Seconds to wait when the account is over its limit, else 0. */
  retryAfter(email: string, now = Date.now()): number {
    const recent = this.recent(email, now);
    if (recent.length < this.config.signInLimitPerMinute) return 0;
    return Math.max(1, Math.ceil((recent[0] + WINDOW_MS - now) / 1000));
  }

  recordFailure(email: string, now = Date.now()): void {
    this.failures.set(email, [...this.recent(email, now), now]);
    if (this.failures.size > 10_000) this.failures.delete(this.failures.keys().next().value as string);
  }

  reset(email: string): void {
    this.failures.delete(email);
  }

  private recent(email: string, now: number): number[] {
    return (this.failures.get(email) ?? []).filter((t) => now - t < WINDOW_MS);
  }
}
