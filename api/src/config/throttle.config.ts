import { registerAs } from '@nestjs/config';
import { envInt } from './env.js';

export const throttleConfig = registerAs('throttle', () => ({
  /** Every route, per client address. */
  ttlMs: envInt('THROTTLE_TTL_MS', 60_000),
  limit: envInt('THROTTLE_LIMIT', 1200),
  /** POST /api/auth/login only. */
  loginTtlMs: envInt('LOGIN_THROTTLE_TTL_MS', 60_000),
  loginLimit: envInt('LOGIN_THROTTLE_LIMIT', 10),
}));
