// Browser run: the real built service on a temporary database with the demo seed, driven through
// Debian's Chromium. Journeys run in order on one page (journeys/index.mjs lists them); each is a
// list of steps that wait on what the screen shows. Any console error fails the run. Screenshots of
// every screen go to e2e/artifacts/, and a failed step leaves its page there as PNG and HTML.
import { existsSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { artifacts, createRunner, launchBrowser, repoRoot, startServer, webRoot } from './harness.mjs';
import { journeys } from './journeys/index.mjs';
import { createSession } from './session.mjs';

for (const needed of [join(repoRoot, 'api', 'dist', 'main.js'), join(webRoot, 'dist', 'index.html')]) {
  if (!existsSync(needed)) {
    console.error(`Missing ${needed}: run \`npm run build\` at the repository root first.`);
    console.log('0 passed, 1 failed');
    process.exit(1);
  }
}

const server = await startServer();
const browser = await launchBrowser();
const page = browser.context.pages()[0] ?? (await browser.context.newPage());
page.setDefaultTimeout(15_000);
if (process.env.CPU_RATE) {
  const cdp = await browser.context.newCDPSession(page);
  await cdp.send('Emulation.setCPUThrottlingRate', { rate: Number(process.env.CPU_RATE) });
}
const runner = createRunner({
  async onFailure(stem) {
    await page.screenshot({ path: join(artifacts, `${stem}.png`), fullPage: true, timeout: 5_000 });
    writeFileSync(join(artifacts, `${stem}.html`), await page.content());
  },
});
const session = createSession(page, server);
/** What one journey leaves for the next (the project and submittal it made). */
const state = {};

console.log(`Browser run against ${server.baseUrl}`);
try {
  for (const [name, journey] of journeys) {
    console.log(`${name}`);
    await journey({ runner, session, state });
  }
} finally {
  if (session.consoleErrors.length > 0)
    runner.fail('no console errors', session.consoleErrors.join('\n    '));
  await browser.close();
  await server.stop();
}

const ok = runner.summary();
process.exitCode = ok ? 0 : 1;
