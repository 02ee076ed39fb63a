// Runs every cli benchmark (bench/*.bench.ts) one after another with tsx, engine first, passing on
// any arguments (e.g. --json). Exits non-zero if a benchmark fails to run.
import { spawnSync } from 'node:child_process';
import { readdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const here = dirname(fileURLToPath(import.meta.url));
const root = join(here, '..');
const benches = readdirSync(here)
  .filter((f) => f.endsWith('.bench.ts'))
  .sort((a, b) => (a === 'engine.bench.ts' ? -1 : b === 'engine.bench.ts' ? 1 : a.localeCompare(b)));

let failed = 0;
for (const file of benches) {
  if (!process.argv.includes('--json')) console.log(`\n== bench/${file} ==`);
  const run = spawnSync('npx', ['tsx', join('bench', file), ...process.argv.slice(2)], {
    cwd: root,
    stdio: 'inherit',
  });
  if (run.status !== 0) {
    failed += 1;
    console.error(`bench/${file} exited with ${run.status ?? run.signal}`);
  }
}
process.exitCode = failed ? 1 : 0;
