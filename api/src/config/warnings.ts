import type { ConfigType } from '@nestjs/config';
import { DEMO_JWT_SECRET, type authConfig } from './auth.config.js';

/** Settings that work but are unsafe for real data; /api/health lists them under `warnings`. */
export function configWarnings(auth: ConfigType<typeof authConfig>): string[] {
  const warnings: string[] = [];
  if (auth.jwtSecret === DEMO_JWT_SECRET) {
    warnings.push(
      'JWT_SECRET is the public demo secret: anyone can forge a sign-in. Set JWT_SECRET (16+ random characters) before this service holds real data.',
    );
  }
  return warnings;
}
