import { registerAs } from '@nestjs/config';
import { envInt, envString } from './env.js';

/** The secret used when none is configured. Start-up warns loudly when it is in use. */
export const DEMO_JWT_SECRET = 'ligament-demo-secret-not-for-production';

export const authConfig = registerAs('auth', () => ({
  jwtSecret: envString('JWT_SECRET', DEMO_JWT_SECRET),
  jwtExpiresIn: envString('JWT_EXPIRES_IN', '8h'),
  inviteTtlHours: envInt('INVITE_TTL_HOURS', 72),
}));
