#!/usr/bin/env node
/**
 * Service benchmark (needs a build: api/dist and cli/dist). Starts the built service in a child
 * process on a temporary SQLite file, then measures on loopback:
 *   1. upload + recompute of a 200-file submittal (target ≤ 3 s), and a recheck of it;
 *   2. with 10,000 discrepancies stored, GET /api/projects/:id/discrepancies at 10 connections
 *      against GET /api/health in the same run, after an unmeasured warm-up of each, in alternating
 *      rounds (targets: ≥ 0.7 × health req/s, p99 ≤ 50 ms in the worst round).
 *   3. concurrency: 50 single-file uploads at once, then 200 discrepancy moves at once, while
 *      /api/health is polled one request after another (targets: 0 errors, health p99 < 100 ms
 *      throughout), then the outbox is drained by the worker and two flushes at once (target: every
 *      mail received exactly once).
 * Prints the figures and the ratio; exits 1 when a target is missed.
 */
import autocannon from 'autocannon';
import { spawn } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import sqlite3 from 'sqlite3';

const ROUNDS = 4;
const ROUND_S = Number(process.env.BENCH_ROUND_S ?? 2);
const WARMUP_S = 2;
const CONNECTIONS = 10;
const FILES = 200;
const TARGET_DISCREPANCIES = 10_000;

const apiDir = fileURLToPath(new URL('..', import.meta.url));
const dir = mkdtempSync(join(tmpdir(), 'ligament-bench-'));
const dbFile = join(dir, 'bench.sqlite');

function freePort() {
  return new Promise((resolve) => {
    const s = createServer().listen(0, '127.0.0.1', () => {
      const { port } = s.address();
      s.close(() => resolve(port));
    });
  });
}

/** A splice plate with two staggered gauge pairs; every fourth claims too much net area. */
function calcFile(i) {
  const width = 12 + (i % 5);
  const s = 1.5 + (i % 3) * 0.5;
  const doc = {
    $schema: 'urn:ligament:schema:calc:1.0',
    format: 'ligament-calc',
    formatVersion: '1.0',
    meta: { project: 'Harbour Lantern Footbridge', preparedBy: 'Bench', date: '2026-11-20' },
    units: 'in',
    code: { standard: 'AISC 360-22', method: 'LRFD' },
    members: [0, 1].map((m) => ({
      id: `B-${i}-${m}`,
      kind: 'splice-plate',
      width,
      thickness: '1/2',
      material: { grade: 'A36', Fy: 36, Fu: 58 },
      holes: [
        { id: 'A1', x: 0, y: 2, bolt: '3/4' },
        { id: 'B1', x: s, y: 5, bolt: '3/4' },
        { id: 'C1', x: 0, y: 8, bolt: '3/4' },
        { id: 'D1', x: s, y: width - 2, bolt: '3/4' },
        { id: 'A2', x: 6, y: 2, bolt: '3/4' },
        { id: 'B2', x: 6 + s, y: 5, bolt: '3/4' },
        { id: 'C2', x: 6, y: 8, bolt: '3/4' },
        { id: 'D2', x: 6 + s, y: width - 2, bolt: '3/4' },
      ],
      load: { directions: ['-x', '+x'], U: 1.0, required: 150 },
      claims:
        i % 4 === 0 ? { An: width * 0.5 - 0.875, chains: [{ holes: ['A1', 'C1'] }] } : { Ag: width * 0.5 },
    })),
  };
  return Buffer.from(JSON.stringify(doc, null, 2));
}

async function json(res) {
  const body = await res.json();
  if (!res.ok) throw new Error(`${res.status} ${JSON.stringify(body).slice(0, 400)}`);
  return body;
}

function run(db, sql) {
  return new Promise((resolve, reject) => db.run(sql, (err) => (err ? reject(err) : resolve())));
}
function get(db, sql) {
  return new Promise((resolve, reject) => db.get(sql, (err, row) => (err ? reject(err) : resolve(row))));
}

/** One autocannon run; resolves with its result and the latency of every response (ms). */
function cannon(url, headers, duration = ROUND_S) {
  return new Promise((resolve, reject) => {
    const latencies = [];
    const instance = autocannon({ url, connections: CONNECTIONS, duration, headers }, (err, result) =>
      err ? reject(err) : resolve({ result, latencies }),
    );
    instance.on('response', (_client, _status, _bytes, ms) => latencies.push(ms));
  });
}

/** The nearest-rank percentile of a list of latencies. */
function percentile(values, p) {
  const sorted = [...values].sort((x, y) => x - y);
  return sorted[Math.max(0, Math.ceil((p / 100) * sorted.length) - 1)] ?? 0;
}

/**
 * The two routes in alternating rounds, so both see the same machine (2 shared cores). req/s is
 * summed over the rounds; p99 is taken over every response of every round (the worst single round's
 * p99 is reported beside it).
 */
async function compare(a, b) {
  const totals = [a, b].map(() => ({ requests: 0, seconds: 0, latencies: [], worstRoundP99: 0, non2xx: 0 }));
  for (let round = 0; round < ROUNDS; round++) {
    for (const [i, target] of [a, b].entries()) {
      const { result, latencies } = await cannon(target.url, target.headers);
      const t = totals[i];
      t.requests += result.requests.total;
      t.seconds += result.duration;
      t.latencies.push(...latencies);
      t.worstRoundP99 = Math.max(t.worstRoundP99, result.latency.p99);
      t.non2xx += result.non2xx;
    }
  }
  return totals.map((t) => ({
    reqPerS: t.requests / t.seconds,
    p99: percentile(t.latencies, 99),
    responses: t.latencies.length,
    worstRoundP99: t.worstRoundP99,
    non2xx: t.non2xx,
  }));
}

const port = await freePort();
const base = `http://127.0.0.1:${port}`;
const child = spawn(process.execPath, ['dist/main.js'], {
  cwd: apiDir,
  env: {
    ...process.env,
    PORT: String(port),
    LIGAMENT_DB: dbFile,
    LIGAMENT_DEMO: 'true',
    LIGAMENT_PUBLIC_URL: base,
    SMTP_FAKE: 'true',
    SMTP_FAKE_PORT: '0',
    THROTTLE_LIMIT: '100000000',
    JWT_SECRET: 'bench-secret-0123456789abcdef',
  },
  stdio: ['ignore', 'pipe', 'inherit'],
});
let exitCode = 0;
try {
  await new Promise((resolve, reject) => {
    let out = '';
    child.stdout.on('data', (chunk) => {
      out += chunk;
      if (out.includes('Ligament is running at')) resolve();
    });
    child.once('exit', (code) => reject(new Error(`service exited with ${code}`)));
  });

  const login = await json(
    await fetch(`${base}/api/auth/login`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email: 'tomasz@larchmont-review.example.test', password: 'lantern-demo-2026' }),
    }),
  );
  const auth = { Authorization: `Bearer ${login.accessToken}` };
  const signIn = async (email) =>
    json(
      await fetch(`${base}/api/auth/login`, {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ email, password: 'lantern-demo-2026' }),
      }),
    ).then((b) => ({ Authorization: `Bearer ${b.accessToken}` }));
  const consultant = await signIn('priya@fennick-ode.example.test');
  const admin = await signIn('sam@tidewater-crossing.example.test');

  // 1. Upload + recompute of a 200-file submittal.
  const form = new FormData();
  form.append('title', `Bench: ${FILES} files`);
  for (let i = 0; i < FILES; i++)
    form.append('files', new Blob([calcFile(i)], { type: 'application/json' }), `bench-${i}.json`);
  const t0 = performance.now();
  const upload = await json(
    await fetch(`${base}/api/projects/1/submittals`, { method: 'POST', headers: auth, body: form }),
  );
  const uploadMs = performance.now() - t0;
  const t1 = performance.now();
  const recheck = await json(
    await fetch(`${base}/api/submittals/${upload.submittalId}/recheck`, { method: 'POST', headers: auth }),
  );
  const recheckMs = performance.now() - t1;

  // 3a. Health while the largest upload the limits allow (20 files of 1,000 holes) is recomputed.
  const bigSamples = [];
  let bigSampling = true;
  const bigSampler = (async () => {
    while (bigSampling) {
      const h0 = performance.now();
      const res = await fetch(`${base}/api/health`);
      await res.arrayBuffer();
      bigSamples.push({ ms: performance.now() - h0, ok: res.status === 200 });
    }
  })();
  const big = new FormData();
  big.append('title', 'Bench: 20,000 holes');
  for (let f = 0; f < 20; f++) {
    const doc = JSON.parse(calcFile(f).toString());
    doc.members = [{ ...doc.members[0], id: `BIG-${f}`, width: 14, claims: {} }];
    doc.members[0].holes = Array.from({ length: 1000 }, (_, i) => ({
      id: `H${i}`,
      x: 3 * Math.floor(i / 4),
      y: 2 + 3 * (i % 4),
      bolt: '3/4',
    }));
    big.append('files', new Blob([JSON.stringify(doc)], { type: 'application/json' }), `big-${f}.json`);
  }
  const b0 = performance.now();
  const bigUpload = await fetch(`${base}/api/projects/1/submittals`, {
    method: 'POST',
    headers: auth,
    body: big,
  });
  await bigUpload.arrayBuffer();
  const bigMs = performance.now() - b0;
  bigSampling = false;
  await bigSampler;
  const bigP99 = percentile(
    bigSamples.map((h) => h.ms),
    99,
  );

  // 3. Concurrency (before the copies of step 2, so the moves act on real rows).
  const healthSamples = [];
  let sampling = true;
  const sampler = (async () => {
    while (sampling) {
      const h0 = performance.now();
      const res = await fetch(`${base}/api/health`);
      await res.arrayBuffer();
      healthSamples.push({ ms: performance.now() - h0, ok: res.status === 200 });
    }
  })();
  const c0 = performance.now();
  const uploads = await Promise.all(
    Array.from({ length: 50 }, async (_, i) => {
      const one = new FormData();
      one.append('title', `Bench: parallel ${i}`);
      one.append('files', new Blob([calcFile(i * 4)], { type: 'application/json' }), `parallel-${i}.json`);
      const res = await fetch(`${base}/api/projects/1/submittals`, {
        method: 'POST',
        headers: consultant,
        body: one,
      });
      await res.arrayBuffer();
      return res.status;
    }),
  );
  const uploadsMs = performance.now() - c0;
  const raised = await json(
    await fetch(`${base}/api/projects/1/discrepancies?status=raised&pageSize=200`, { headers: consultant }),
  );
  const m0 = performance.now();
  const moves = await Promise.all(
    raised.items.map(async (d) => {
      const res = await fetch(`${base}/api/discrepancies/${d.id}/transitions`, {
        method: 'POST',
        headers: { ...consultant, 'content-type': 'application/json' },
        body: JSON.stringify({ to: 'answered', note: 'Bench: answered at once.' }),
      });
      await res.arrayBuffer();
      return res.status;
    }),
  );
  const movesMs = performance.now() - m0;
  // Drain the outbox: the service's worker runs meanwhile, and two flushes go at once.
  const outboxDb = new sqlite3.Database(dbFile, sqlite3.OPEN_READONLY);
  for (let i = 0; i < 200; i++) {
    const { n } = await get(outboxDb, "SELECT COUNT(*) AS n FROM mail_outbox WHERE status = 'pending'");
    if (n === 0) break;
    await Promise.all(
      [1, 2].map(async () =>
        (await fetch(`${base}/api/mail/outbox/flush`, { method: 'POST', headers: admin })).arrayBuffer(),
      ),
    );
  }
  sampling = false;
  await sampler;
  const { n: sentMails } = await get(outboxDb, "SELECT COUNT(*) AS n FROM mail_outbox WHERE status = 'sent'");
  const { n: pendingMails } = await get(
    outboxDb,
    "SELECT COUNT(*) AS n FROM mail_outbox WHERE status = 'pending'",
  );
  const { n: receivedMails } = await get(outboxDb, 'SELECT COUNT(*) AS n FROM mailbox_messages');
  await new Promise((resolve) => outboxDb.close(resolve));
  const uploadErrors = uploads.filter((st) => st !== 201).length;
  const moveErrors = moves.filter((st) => st !== 200).length;
  const healthP99 = percentile(
    healthSamples.map((h) => h.ms),
    99,
  );
  const healthErrors = healthSamples.filter((h) => !h.ok).length;
  const mailOnce = receivedMails === sentMails && pendingMails === 0;

  // 2. Bring the project to 10,000 stored discrepancies by copying real rows (same shape, same indexes).
  const db = new sqlite3.Database(dbFile);
  await run(db, 'PRAGMA busy_timeout = 10000');
  const { n: have } = await get(db, 'SELECT COUNT(*) AS n FROM discrepancies WHERE projectId = 1');
  const copies = Math.ceil((TARGET_DISCREPANCIES - have) / have);
  const cols =
    'projectId, submittalId, calcFileId, fileName, memberId, code, name, class, severity, direction, chain, claimed, recomputed, message, pointer, status, acknowledgedAt, acknowledgedById, createdAt, updatedAt, firstRaisedAt, supersededBySubmittalId, assigneeId, dueDate';
  await run(
    db,
    `INSERT INTO discrepancies (${cols})
     WITH RECURSIVE k(i) AS (SELECT 1 UNION ALL SELECT i + 1 FROM k WHERE i < ${copies})
     SELECT ${cols} FROM discrepancies, k WHERE projectId = 1`,
  );
  await run(
    db,
    `DELETE FROM discrepancies WHERE id IN (SELECT id FROM discrepancies WHERE projectId = 1 ORDER BY id DESC LIMIT (SELECT COUNT(*) - ${TARGET_DISCREPANCIES} FROM discrepancies WHERE projectId = 1))`,
  );
  const { n: stored } = await get(db, 'SELECT COUNT(*) AS n FROM discrepancies WHERE projectId = 1');
  await new Promise((resolve) => db.close(resolve));

  const listUrl = `${base}/api/projects/1/discrepancies?status=open&sort=severity&order=asc&page=3&pageSize=50`;
  const probe = await json(await fetch(listUrl, { headers: auth }));
  // Warm-up, not measured: both routes at full load until the JIT has compiled their paths.
  await cannon(`${base}/api/health`, {}, WARMUP_S);
  await cannon(listUrl, auth, WARMUP_S);
  const [health, list] = await compare(
    { url: `${base}/api/health`, headers: {} },
    { url: listUrl, headers: auth },
  );
  const ratio = list.reqPerS / health.reqPerS;
  const rows = [
    [
      'upload + recompute, 200 files',
      `${uploadMs.toFixed(0)} ms`,
      `${upload.summary.members} members, ${upload.summary.findings} findings`,
      uploadMs <= 3000 ? 'ok (≤ 3000 ms)' : 'MISSED (≤ 3000 ms)',
    ],
    ['recheck of the same submittal', `${recheckMs.toFixed(0)} ms`, `changed: ${recheck.changed}`, ''],
    [
      'GET /api/health',
      `${health.reqPerS.toFixed(0)} req/s`,
      `p99 ${health.p99.toFixed(1)} ms (worst round ${health.worstRoundP99}), non-2xx ${health.non2xx}`,
      '',
    ],
    [
      `GET discrepancies (${stored} stored, ${probe.total} open)`,
      `${list.reqPerS.toFixed(0)} req/s`,
      `p99 ${list.p99.toFixed(1)} ms (worst round ${list.worstRoundP99}), non-2xx ${list.non2xx}`,
      list.p99 <= 50 ? 'ok (p99 ≤ 50 ms)' : 'MISSED (p99 ≤ 50 ms)',
    ],
    ['ratio list / health', ratio.toFixed(2), '', ratio >= 0.7 ? 'ok (≥ 0.70)' : 'MISSED (≥ 0.70)'],
    [
      'upload of 20,000 holes (the limit)',
      `${bigMs.toFixed(0)} ms`,
      `status ${bigUpload.status}; health p99 ${bigP99.toFixed(1)} ms over ${bigSamples.length} polls`,
      bigUpload.status === 201 && bigP99 < 100 ? 'ok (health p99 < 100 ms)' : 'MISSED (health p99 < 100 ms)',
    ],
    [
      '50 uploads at once',
      `${uploadsMs.toFixed(0)} ms`,
      `errors ${uploadErrors}`,
      uploadErrors === 0 ? 'ok (0 errors)' : 'MISSED (0 errors)',
    ],
    [
      `${moves.length} moves at once`,
      `${movesMs.toFixed(0)} ms`,
      `errors ${moveErrors}`,
      moveErrors === 0 && moves.length === 200 ? 'ok (200, 0 errors)' : 'MISSED (200, 0 errors)',
    ],
    [
      'GET /api/health during uploads, moves, mail',
      `p99 ${healthP99.toFixed(1)} ms`,
      `${healthSamples.length} polls, max ${Math.max(...healthSamples.map((h) => h.ms)).toFixed(1)} ms, errors ${healthErrors}`,
      healthP99 < 100 && healthErrors === 0 ? 'ok (p99 < 100 ms)' : 'MISSED (p99 < 100 ms)',
    ],
    [
      'mail sent once',
      `${receivedMails} received`,
      `${sentMails} sent, ${pendingMails} pending`,
      mailOnce ? 'ok (received = sent)' : 'MISSED (received = sent)',
    ],
  ];
  process.stdout.write(
    `\nLigament API bench (loopback, ${CONNECTIONS} connections, ${ROUNDS} alternating rounds of ${ROUND_S} s per route)\n`,
  );
  for (const r of rows)
    process.stdout.write(`  ${r[0].padEnd(48)} ${r[1].padStart(12)}  ${r[2].padEnd(52)} ${r[3]}\n`);
  if (uploadMs > 3000 || list.p99 > 50 || ratio < 0.7 || list.non2xx > 0 || health.non2xx > 0) exitCode = 1;
  if (bigUpload.status !== 201 || bigP99 >= 100) exitCode = 1;
  if (uploadErrors || moveErrors || moves.length !== 200 || healthP99 >= 100 || healthErrors || !mailOnce)
    exitCode = 1;
} catch (error) {
  process.stderr.write(`bench: ${error instanceof Error ? error.message : String(error)}\n`);
  exitCode = 2;
} finally {
  // autocannon leaves requests in flight when its time is up; let the service answer them first.
  await new Promise((resolve) => setTimeout(resolve, 500));
  child.kill('SIGTERM');
  await new Promise((resolve) => (child.exitCode !== null ? resolve() : child.once('exit', resolve)));
  rmSync(dir, { recursive: true, force: true });
}
process.exitCode = exitCode;
