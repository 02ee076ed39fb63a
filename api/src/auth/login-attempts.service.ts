import { Inject, Injectable } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { throttleConfig } from '../config/index.js';

interface Window {
  count: number;
  resetAt: number;
}

/** Above this many tracked keys, expired windows are swept on the next failure. */
const SWEEP_AT = 10_000;

/**
 * Failed sign-ins, counted per account (the e-mail as typed, known or not) and per client address in
 * a fixed window. Successful sign-ins are not counted. While either count is at its limit every
 * attempt for that account or from that address is refused with the seconds until the window ends,
 * so a correct guess cannot be told apart from a wrong one during a lock-out. In memory: one process.
 */
@Injectable()
export class LoginAttemptsService {
  private readonly failures = new Map<string, Window>();

  constructor(@Inject(throttleConfig.KEY) private readonly config: ConfigType<typeof throttleConfig>) {}

  /** Seconds until the caller may try again (0 = may try now). */
  retryAfterSeconds(email: string, address: string, now = Date.now()): number {
    const waits = [
      this.wait(accountKey(email), this.config.loginAccountLimit, now),
      this.wait(addressKey(address), this.config.loginLimit, now),
    ];
    return Math.max(...waits);
  }

  recordFailure(email: string, address: string, now = Date.now()): void {
    if (this.failures.size > SWEEP_AT) this.sweep(now);
    for (const key of [accountKey(email), addressKey(address)]) {
      const window = this.failures.get(key);
      if (window && window.resetAt > now) window.count++;
      else this.failures.set(key, { count: 1, resetAt: now + this.config.loginTtlMs });
    }
  }

  /** A correct password clears the account's failures (not the address's: one good account must not
   * reset the count for guesses at the others). */
  recordSuccess(email: string): void {
    this.failures.delete(accountKey(email));
  }

  private wait(key: string, limit: number, now: number): number {
    const window = this.failures.get(key);
    if (!window || window.resetAt <= now || window.count < limit) return 0;
    return Math.max(1, Math.ceil((window.resetAt - now) / 1000));
  }

  private sweep(now: number): void {
    for (const [key, window] of this.failures) if (window.resetAt <= now) this.failures.delete(key);
  }
}

const accountKey = (email: string) => `account:${email.trim().toLowerCase()}`;
const addressKey = (address: string) => `address:${address}`;
