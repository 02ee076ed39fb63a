// Test harness for the browser run: starts the real built service on a temporary database and a
// free port, drives Debian's Chromium through playwright-core, records console errors, and keeps
// a tally of passed and failed steps.
import { spawn } from 'node:child_process';
import { mkdirSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium } from 'playwright-core';

export const webRoot = join(dirname(fileURLToPath(import.meta.url)), '..');
export const repoRoot = join(webRoot, '..');
export const artifacts = join(webRoot, 'e2e', 'artifacts');

export function freePort() {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.unref();
    server.on('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address();
      server.close(() => resolve(port));
    });
  });
}

/** Starts `node api/dist/main.js` with a fresh SQLite file and the demo seed; resolves once /api answers. */
export async function startServer() {
  const dataDir = mkdtempSync(join(tmpdir(), 'ligament-e2e-'));
  const port = await freePort();
  const smtpPort = await freePort();
  const env = {
    ...process.env,
    PORT: String(port),
    HOST: '127.0.0.1',
    LIGAMENT_DB: join(dataDir, 'ligament.sqlite'),
    LIGAMENT_DEMO: 'true',
    LIGAMENT_WEB_DIST: join(webRoot, 'dist'),
    LIGAMENT_PUBLIC_URL: `http://127.0.0.1:${port}`,
    SMTP_FAKE: 'true',
    SMTP_FAKE_PORT: String(smtpPort),
    MAIL_RETRY_INTERVAL_MS: '500',
    THROTTLE_LIMIT: '100000',
    LOGIN_THROTTLE_LIMIT: '1000',
    LOG_LEVEL: 'warn',
  };
  const child = spawn(process.execPath, [join(repoRoot, 'api', 'dist', 'main.js')], {
    env,
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let log = '';
  child.stdout.on('data', (d) => (log += d));
  child.stderr.on('data', (d) => (log += d));
  const baseUrl = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + 60_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`The service exited with ${child.exitCode}:\n${log}`);
    try {
      const res = await fetch(`${baseUrl}/api/health`);
      if (res.ok) break;
    } catch {
      // not listening yet
    }
    if (Date.now() > deadline) throw new Error(`The service did not answer within 60 s:\n${log}`);
    await new Promise((r) => setTimeout(r, 250));
  }
  return {
    baseUrl,
    log: () => log,
    async stop() {
      child.kill('SIGTERM');
      await new Promise((r) => (child.exitCode !== null ? r() : child.once('exit', r)));
      rmSync(dataDir, { recursive: true, force: true });
    },
  };
}

export async function launchBrowser() {
  const profile = mkdtempSync(join(tmpdir(), 'ligament-chromium-'));
  const executablePath = process.env.LIGAMENT_CHROMIUM ?? '/usr/bin/chromium';
  const context = await chromium.launchPersistentContext(profile, {
    executablePath,
    headless: true,
    viewport: { width: 1280, height: 860 },
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
  return {
    context,
    async close() {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

/**
 * Slows the page's CPU by `LIGAMENT_E2E_CPU_THROTTLE` (e.g. 4 or 6; unset or 1: full speed) through
 * Chromium's `Emulation.setCPUThrottlingRate`, to bring out on a fast machine the races a loaded one
 * shows: clicks on buttons that re-render, waits that pass on stale content, lists refetching.
 * Returns the rate in force.
 */
export async function throttleCpu(context, page) {
  const text = process.env.LIGAMENT_E2E_CPU_THROTTLE;
  if (text === undefined || text === '') return 1;
  const rate = Number(text);
  if (!Number.isFinite(rate) || rate < 1 || rate > 20) {
    throw new Error(`LIGAMENT_E2E_CPU_THROTTLE must be a number from 1 to 20, not ${JSON.stringify(text)}`);
  }
  if (rate > 1) {
    const cdp = await context.newCDPSession(page);
    await cdp.send('Emulation.setCPUThrottlingRate', { rate });
  }
  return rate;
}

/** A file-name-safe form of a step's name. */
const slug = (name) =>
  name
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-|-$/g, '')
    .slice(0, 60);

/**
 * Steps run in order; a failed step is reported and the rest still run unless they depend on it.
 * On a failure, `onFailure(fileStem)` is awaited so the run can keep what the page showed
 * (`failed-NN-<step>.png` and `.html` in e2e/artifacts/).
 */
export function createRunner({ onFailure } = {}) {
  let passed = 0;
  let failed = 0;
  const failures = [];
  mkdirSync(artifacts, { recursive: true });
  // A failure kept by an earlier run would read as this run's.
  for (const name of readdirSync(artifacts))
    if (name.startsWith('failed-')) rmSync(join(artifacts, name), { force: true });
  const keep = async (name) => {
    if (!onFailure) return '';
    const stem = `failed-${String(failures.length).padStart(2, '0')}-${slug(name)}`;
    try {
      await onFailure(stem);
      return `\n    kept e2e/artifacts/${stem}.png and .html`;
    } catch (error) {
      return `\n    (could not keep the page: ${error?.message ?? error})`;
    }
  };
  return {
    async step(name, fn) {
      const started = Date.now();
      try {
        await fn();
        passed += 1;
        console.log(`  ✓ ${name} (${Date.now() - started} ms)`);
        return true;
      } catch (error) {
        failed += 1;
        failures.push({ name, error });
        const kept = await keep(name);
        console.log(
          `  ✗ ${name}\n    ${String(error?.stack ?? error)
            .split('\n')
            .slice(0, 6)
            .join('\n    ')}${kept}`,
        );
        return false;
      }
    },
    fail(name, message) {
      failed += 1;
      failures.push({ name, error: new Error(message) });
      console.log(`  ✗ ${name}\n    ${message}`);
    },
    summary() {
      console.log(`${passed} passed, ${failed} failed`);
      return failed === 0;
    },
  };
}
