// Renders an SVG file to PNG in headless Chromium, for looking at `ligament draw` output.
// Usage: node test/tools/render-png.mjs in.svg out.png [pixelsPerMm]
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium } from 'playwright-core';

const [input, output, ppmArg] = process.argv.slice(2);
if (!input || !output) {
  process.stderr.write('usage: node test/tools/render-png.mjs in.svg out.png [pixelsPerMm]\n');
  process.exit(2);
}
const ppm = Number(ppmArg ?? 6);
const svg = readFileSync(input, 'utf8');
const mm = (attr) => Number(new RegExp(`${attr}="([0-9.]+)mm"`).exec(svg)?.[1] ?? 200);
const width = Math.ceil(mm('width') * ppm);
const height = Math.ceil(mm('height') * ppm);
const profile = mkdtempSync(join(tmpdir(), 'ligament-chromium-'));
const context = await chromium.launchPersistentContext(profile, {
  executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
  headless: true,
  viewport: { width, height },
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
try {
  const page = context.pages()[0] ?? (await context.newPage());
  const sized = svg.replace(/width="[0-9.]+mm" height="[0-9.]+mm"/, `width="${width}" height="${height}"`);
  await page.setContent(`<html><body style="margin:0">${sized}</body></html>`);
  await page.screenshot({ path: output, clip: { x: 0, y: 0, width, height } });
} finally {
  await context.close();
  rmSync(profile, { recursive: true, force: true });
}
