import { Logger } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { CAUTION } from 'ligament';
import { appConfig, authConfig, DEMO_JWT_SECRET, environmentProblem } from './config/index.js';

const problem = environmentProblem();
if (problem) {
  process.stderr.write(`Ligament could not start: ${problem}\n`);
  process.exit(1);
}
// Imported only now: the app module validates the environment as it loads.
const { createApp } = await import('./create-app.js');
const { SeedService } = await import('./seed/seed.service.js');
const { DatabaseService } = await import('./database/database.service.js');
const { ROLE_NAMES } = await import('./auth/role.enum.js');

const logger = new Logger('Ligament');
const app = await createApp().catch((error: unknown) => {
  // One line, not a stack trace: the usual causes are a bad environment or an unreadable database.
  const message = error instanceof Error ? error.message.split('\n').slice(0, 6).join('\n') : String(error);
  process.stderr.write(`Ligament could not start: ${message}\n`);
  process.exit(1);
});
const config = app.get<ConfigType<typeof appConfig>>(appConfig.KEY);
const auth = app.get<ConfigType<typeof authConfig>>(authConfig.KEY);

if (auth.jwtSecret === DEMO_JWT_SECRET) {
  logger.warn('!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!');
  logger.warn(
    'JWT_SECRET is not set: sign-ins are signed with the PUBLIC DEMO SECRET. Anyone can forge them.',
  );
  logger.warn('Set JWT_SECRET (16+ characters) before this service holds real data.');
  logger.warn('!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!!');
}

/**
 * One way out: close HTTP (requests in flight finish), let the outbox step and queued writes finish,
 * close the database, then exit with `code` (0 on SIGTERM/SIGINT). A second signal, or a close that
 * takes more than 10 s, exits at once.
 */
let stopping = false;
async function stop(code: number, why: string): Promise<void> {
  if (stopping) {
    process.exit(code || 1);
  }
  stopping = true;
  process.stdout.write(`Ligament is stopping (${why})...\n`);
  setTimeout(() => {
    process.stderr.write('Ligament: shutdown took more than 10 s; exiting now.\n');
    process.exit(code || 1);
  }, 10_000).unref();
  try {
    await app.close();
  } catch (error) {
    process.stderr.write(
      `Ligament: shutdown failed: ${error instanceof Error ? error.message : String(error)}\n`,
    );
    code ||= 1;
  }
  process.stdout.write('Ligament stopped.\n');
  process.exit(code);
}
for (const signal of ['SIGTERM', 'SIGINT'] as const) process.on(signal, () => void stop(0, signal));
// A damaged, vanished or unreadable database file: stop non-zero so a supervisor restarts the service.
app.get(DatabaseService).onUnrecoverable((fault) => void stop(1, `database ${fault.code}`));

const seeded = config.demo ? await app.get(SeedService).seedIfEmpty() : null;
await app.listen(config.port, config.host);

const lines = [
  '',
  `Ligament is running at ${config.publicUrl}`,
  `  API docs:  ${config.publicUrl}/api/docs`,
  `  Health:    ${config.publicUrl}/api/health`,
];
if (config.demo) {
  lines.push(
    `  Mailbox:   ${config.publicUrl}/api/mail/mailbox (demo mode: mail caught by the local SMTP fake)`,
  );
  lines.push(
    seeded
      ? '  Demo data: seeded now (Harbour Lantern Footbridge).'
      : '  Demo data: database already has data; not re-seeded.',
  );
  lines.push('  Demo sign-ins (every account uses the same demo password):');
  for (const u of SeedService.DEMO_USERS)
    lines.push(`    ${ROLE_NAMES[u.role].padEnd(23)} ${u.email.padEnd(42)} ${SeedService.DEMO_PASSWORD}`);
}
lines.push('', CAUTION, '');
process.stdout.write(`${lines.join('\n')}\n`);
