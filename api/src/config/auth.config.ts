import { registerAs } from '@nestjs/config';
import { envInt, envString } from './env.js';

/** The secret used when none is configured. Start-up warns loudly when it is in use. */
export const DEMO_JWT_SECRET = 'ligament-demo-secret-not-for-production';

export const authConfig = registerAs('auth', () => ({
  jwtSecret: envString('JWT_SECRET', DEMO_JWT_SECRET),
  /** Lifetime of a sign-in's access token; the browser renews it with its refresh cookie. */
  jwtExpiresIn: envString('JWT_EXPIRES_IN', '15m'),
  inviteTtlHours: envInt('INVITE_TTL_HOURS', 72),
  /** A refresh token not used for this long lapses, and its session with it. */
  sessionIdleHours: envInt('SESSION_IDLE_HOURS', 168),
  /** No session outlives this, however often it is refreshed. */
  sessionMaxDays: envInt('SESSION_MAX_DAYS', 30),
  /** How long after its rotation a refresh token still counts as a tab's race, not a replay. */
  refreshRaceGraceSeconds: envInt('REFRESH_RACE_GRACE_SECONDS', 30),
}));
