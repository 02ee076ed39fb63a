import { registerAs } from '@nestjs/config';
import { envInt } from './env.js';

export const throttleConfig = registerAs('throttle', () => ({
  /** Every route, per client address. */
  ttlMs: envInt('THROTTLE_TTL_MS', 60_000),
  limit: envInt('THROTTLE_LIMIT', 1200),
  /** POST /api/auth/login: failed sign-ins in a window, per client address and per account. */
  loginTtlMs: envInt('LOGIN_THROTTLE_TTL_MS', 60_000),
  loginLimit: envInt('LOGIN_THROTTLE_LIMIT', 20),
  loginAccountLimit: envInt('LOGIN_ACCOUNT_THROTTLE_LIMIT', 5),
}));
