// Builds the web app and reports the gzipped size of what the browser loads before the first
// screen: the entry chunk, every chunk it imports statically, and their CSS. Lazy route chunks
// (dynamic imports) are listed separately. Budget: 250 kB gzipped of initial JS.
import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { gzipSync } from 'node:zlib';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const dist = join(root, 'dist');
const BUDGET_KB = 250;

if (!process.argv.includes('--no-build')) {
  execFileSync('npm', ['run', 'build'], { cwd: root, stdio: ['ignore', 'ignore', 'inherit'] });
}

const manifest = JSON.parse(readFileSync(join(dist, '.vite', 'manifest.json'), 'utf8'));
const gz = (file) => gzipSync(readFileSync(join(dist, file)), { level: 9 }).length;

const initial = new Set();
const css = new Set();
const visit = (key) => {
  const chunk = manifest[key];
  if (!chunk || initial.has(chunk.file)) return;
  initial.add(chunk.file);
  for (const c of chunk.css ?? []) css.add(c);
  for (const imported of chunk.imports ?? []) visit(imported);
};
const entries = Object.keys(manifest).filter((key) => manifest[key].isEntry);
for (const key of entries) visit(key);

const lazy = Object.values(manifest)
  .filter((chunk) => chunk.file.endsWith('.js') && !initial.has(chunk.file))
  .map((chunk) => ({ file: chunk.file, gzip: gz(chunk.file) }))
  .sort((a, b) => b.gzip - a.gzip);

const kb = (bytes) => (bytes / 1024).toFixed(1);
const initialJs = [...initial].reduce((sum, file) => sum + gz(file), 0);
const initialCss = [...css].reduce((sum, file) => sum + gz(file), 0);

console.log('Initial chunks (gzip -9):');
for (const file of initial) console.log(`  ${file.padEnd(48)} ${kb(gz(file)).padStart(7)} kB`);
for (const file of css) console.log(`  ${file.padEnd(48)} ${kb(gz(file)).padStart(7)} kB`);
console.log(`Lazy chunks: ${lazy.length}, largest:`);
for (const chunk of lazy.slice(0, 8))
  console.log(`  ${chunk.file.padEnd(48)} ${kb(chunk.gzip).padStart(7)} kB`);
console.log(
  `initial JS ${kb(initialJs)} kB gzipped (budget ${BUDGET_KB} kB), initial CSS ${kb(initialCss)} kB`,
);
if (initialJs / 1024 > BUDGET_KB) {
  console.error(`Over budget by ${kb(initialJs - BUDGET_KB * 1024)} kB`);
  process.exitCode = 1;
}
