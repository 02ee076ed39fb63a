/**
 * Command-line benchmarks (not tests): run with `npm run bench -w cli` after a build.
 *
 * 1. Cold start: median wall time of `node dist/cli.js --help` against a bare `node -e 0`, 15 runs
 *    each, interleaved after two warm-up runs; target ratio ≤ 1.25. The machine is shared, so the
 *    two are interleaved to see the same load.
 * 2. Throughput: `ligament check` over 1,000 generated calc files (one member each, 2 to 60 holes on
 *    staggered gauge lines, in a temp dir): wall time (target ≤ 3 s) and peak RSS, plus the peak RSS
 *    of the same run over 250 files to show memory stays flat.
 */
import { spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '..');
const bin = join(root, 'dist', 'cli.js');

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  const mid = Math.floor(s.length / 2);
  return s.length % 2 ? s[mid]! : (s[mid - 1]! + s[mid]!) / 2;
}

function timeRun(args: string[], cwd = root): { ms: number; status: number | null; stderr: string } {
  const t0 = process.hrtime.bigint();
  const r = spawnSync(process.execPath, args, { cwd, encoding: 'utf8', maxBuffer: 256 * 1024 * 1024 });
  const ms = Number(process.hrtime.bigint() - t0) / 1e6;
  return { ms, status: r.status, stderr: r.stderr };
}

// Deterministic generator (mulberry32) so every run checks the same files.
function rng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** One calc file: `lines` gauge lines 3 in apart, `rows` rows 3 in apart, odd lines staggered 1-1/2 in. */
function calcFile(index: number, lines: number, rows: number, random: () => number): string {
  const holes: object[] = [];
  for (let j = 0; j < lines; j += 1) {
    for (let i = 0; i < rows; i += 1) {
      holes.push({ id: `H${j + 1}-${i + 1}`, x: i * 3 + (j % 2) * 1.5, y: 1.5 + j * 3, bolt: '3/4' });
    }
  }
  const width = (lines - 1) * 3 + 3;
  const claims =
    random() < 0.5
      ? { An: Math.round(width * 0.5 * (0.8 + random() * 0.15) * 1000) / 1000, U: 1.0 }
      : undefined;
  return JSON.stringify({
    format: 'ligament-calc',
    formatVersion: '1.0',
    meta: {
      project: 'Harbour Lantern Footbridge (bench)',
      preparedBy: 'Priya Halvorsen',
      date: '2026-11-20',
    },
    units: 'in',
    code: { standard: 'AISC 360-22', method: 'LRFD' },
    members: [
      {
        id: `M-${index}`,
        kind: random() < 0.5 ? 'splice-plate' : 'plate',
        width,
        thickness: '1/2',
        material: { grade: 'A36', Fy: 36, Fu: 58 },
        holes,
        load: { directions: random() < 0.5 ? ['-x', '+x'] : ['-x'] },
        ...(claims ? { claims } : {}),
      },
    ],
  });
}

function generate(dir: string, count: number): { holes: number; max: number } {
  mkdirSync(dir, { recursive: true });
  const random = rng(20261120);
  let holes = 0;
  let max = 0;
  for (let n = 0; n < count; n += 1) {
    const lines = 2 + Math.floor(random() * 5); // 2..6
    const rows = 1 + Math.floor(random() * Math.min(10, Math.floor(60 / lines))); // ≤ 60 holes
    holes += lines * rows;
    max = Math.max(max, lines * rows);
    writeFileSync(join(dir, `calc-${String(n).padStart(4, '0')}.json`), calcFile(n, lines, rows, random));
  }
  return { holes, max };
}

const asJson = process.argv.includes('--json');
const say = (line: string): void => {
  if (!asJson) console.log(line);
};

const work = mkdtempSync(join(tmpdir(), 'ligament-bench-'));
try {
  // 1. Cold start.
  const bare: number[] = [];
  const help: number[] = [];
  for (let i = 0; i < 2; i += 1) {
    timeRun(['-e', '0']);
    timeRun([bin, '--help']);
  }
  for (let i = 0; i < 15; i += 1) {
    bare.push(timeRun(['-e', '0']).ms);
    help.push(timeRun([bin, '--help']).ms);
  }
  const ratio = median(help) / median(bare);
  say('cold start (15 runs each, interleaved)');
  say(`  node -e 0                 median ${median(bare).toFixed(1)} ms`);
  say(`  node dist/cli.js --help   median ${median(help).toFixed(1)} ms`);
  say(`  ratio ${ratio.toFixed(3)} (target ≤ 1.25) ${ratio <= 1.25 ? 'met' : 'NOT met'}`);

  // 2. Throughput and memory. A preload hook prints the process's peak RSS at exit.
  const hook = join(work, 'rss-hook.mjs');
  writeFileSync(
    hook,
    "import { writeSync } from 'node:fs';\nprocess.on('exit', () => writeSync(2, `\\nPEAK_RSS_KB ${process.resourceUsage().maxRSS}\\n`));\n",
  );
  const measure = (count: number): { ms: number; rssMb: number; holes: number; max: number } => {
    const dir = join(work, `calcs-${count}`);
    const gen = generate(dir, count);
    const out = join(work, `report-${count}.txt`);
    const r = timeRun(['--import', hook, bin, 'check', dir, '--fail-on', 'none', '--output', out]);
    if (r.status !== 0)
      throw new Error(`check over ${count} files exited ${r.status}: ${r.stderr.slice(0, 400)}`);
    const rss = Number(/PEAK_RSS_KB (\d+)/.exec(r.stderr)?.[1] ?? NaN) / 1024;
    const report = readFileSync(out, 'utf8');
    if (!report.includes(`${count} files, ${count} members`))
      throw new Error('report totals do not match the files');
    return { ms: r.ms, rssMb: rss, ...gen };
  };
  const small = measure(250);
  const full = measure(1000);
  say('ligament check over generated calc files (text report to a file)');
  say(
    `  250 files  (${small.holes} holes, up to ${small.max} per member): ${small.ms.toFixed(0)} ms, peak RSS ${small.rssMb.toFixed(1)} MB`,
  );
  say(
    `  1000 files (${full.holes} holes, up to ${full.max} per member): ${full.ms.toFixed(0)} ms (target ≤ 3000 ms) ${full.ms <= 3000 ? 'met' : 'NOT met'}, peak RSS ${full.rssMb.toFixed(1)} MB`,
  );
  say(`  peak RSS growth 250 → 1000 files: ${(full.rssMb - small.rssMb).toFixed(1)} MB`);

  // What a run keeps: the heap after a full GC with the run's reports still held, in-process.
  const retainScript = join(work, 'retain.mjs');
  writeFileSync(
    retainScript,
    [
      `const { runCheck } = await import(${JSON.stringify(join(root, 'dist', 'runner', 'check.js'))});`,
      `const { readSources } = await import(${JSON.stringify(join(root, 'dist', 'node', 'sources.js'))});`,
      `const { DEFAULT_COMMAND_LINE_TOLERANCE } = await import(${JSON.stringify(join(root, 'dist', 'runner', 'tolerance.js'))});`,
      'const held = [];',
      'for (const dir of process.argv.slice(2)) {',
      '  globalThis.gc(); const before = process.memoryUsage().heapUsed;',
      "  held.push(await runCheck(readSources([dir], { cwd: dir, readStdin: async () => '' }), { command: 'check', settings: { tolerance: DEFAULT_COMMAND_LINE_TOLERANCE, failOn: 'none', k: 10 }, version: '0', keepDetail: false }));",
      '  globalThis.gc(); console.log((process.memoryUsage().heapUsed - before) / 1048576);',
      '}',
    ].join('\n'),
  );
  const retained = spawnSync(
    process.execPath,
    ['--expose-gc', retainScript, join(work, 'calcs-250'), join(work, 'calcs-1000')],
    {
      encoding: 'utf8',
    },
  )
    .stdout.trim()
    .split('\n')
    .map(Number);
  say(
    `  heap kept by the reports (after GC): 250 files ${retained[0]?.toFixed(1)} MB (first run, with the modules it loads), then 1000 files ${retained[1]?.toFixed(1)} MB (${(((retained[1] ?? 0) * 1024) / 1000).toFixed(1)} kB per file)`,
  );
  if (asJson) {
    console.log(
      JSON.stringify({
        bench: 'cli',
        coldStart: { bareMedianMs: median(bare), helpMedianMs: median(help), ratio, target: 1.25 },
        check1000: { wallMs: full.ms, peakRssMb: full.rssMb, holes: full.holes, targetMs: 3000 },
        check250: { wallMs: small.ms, peakRssMb: small.rssMb, holes: small.holes },
        retainedHeapMb: { files250: retained[0], files1000: retained[1] },
      }),
    );
  }
} finally {
  rmSync(work, { recursive: true, force: true });
}
