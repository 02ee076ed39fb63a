import { registerAs } from '@nestjs/config';
import { appConfig } from './app.config.js';
import { envInt, envString } from './env.js';

export const databaseConfig = registerAs('database', () => ({
  /** SQLite file, or ":memory:". Default: data/ligament.sqlite at the repository root (gitignored). */
  storage: envString('LIGAMENT_DB', `${appConfig().repoRoot}data/ligament.sqlite`),
  busyTimeoutMs: envInt('LIGAMENT_DB_BUSY_TIMEOUT_MS', 5000),
}));
