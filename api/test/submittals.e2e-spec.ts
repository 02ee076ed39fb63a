import { createHash } from 'node:crypto';
import { Sequelize } from 'sequelize-typescript';
import request from 'supertest';
import { bearer, bootApp, calcFile, EMAIL, login, type TestApp } from './helpers.js';

let t: TestApp;
let consultant: string;
let checker: string;
let admin: string;
const TABLES = ['submittals', 'calc_files', 'member_results', 'discrepancies', 'events', 'mail_outbox'];

async function counts(): Promise<Record<string, number>> {
  const seq = t.app.get(Sequelize);
  const out: Record<string, number> = {};
  for (const table of TABLES) {
    const [rows] = await seq.query(`SELECT COUNT(*) AS n FROM ${table}`);
    out[table] = (rows as { n: number }[])[0]?.n ?? -1;
  }
  return out;
}

/** A file whose member misses its material and whose hole A1 misses its y: invalid twice. */
function badFile(): Buffer {
  const doc = JSON.parse(calcFile('SP-BAD').toString()) as { members: Record<string, unknown>[] };
  const member = doc.members[0] as Record<string, unknown>;
  member.holes = [{ id: 'A1', x: 0, bolt: '3/4' }];
  delete member.material;
  return Buffer.from(JSON.stringify(doc, null, 2));
}

function padded(memberId: string, bytes: number): Buffer {
  const doc = JSON.parse(calcFile(memberId).toString()) as { meta: Record<string, unknown> };
  doc.meta.notes = 'x'.repeat(bytes);
  return Buffer.from(JSON.stringify(doc));
}

function upload(
  token: string,
  files: [string, Buffer][],
  title = 'Upload',
  revisionOf?: number,
  projectId = 1,
) {
  let req = request(t.http)
    .post(`/api/projects/${projectId}/submittals`)
    .set(bearer(token))
    .field('title', title);
  if (revisionOf !== undefined) req = req.field('revisionOf', String(revisionOf));
  for (const [name, content] of files) req = req.attach('files', content, name);
  return req;
}

beforeAll(async () => {
  t = await bootApp({
    UPLOAD_MAX_FILE_BYTES: '20000',
    UPLOAD_MAX_FILES: '12',
    UPLOAD_MAX_TOTAL_BYTES: '60000',
  });
  consultant = await login(t.http, EMAIL.consultant);
  checker = await login(t.http, EMAIL.checker);
  admin = await login(t.http, EMAIL.admin);
});
afterAll(async () => t.close());

describe('upload atomicity', () => {
  it('one bad file in ten: 422 with every error of that file, and nothing is stored', async () => {
    const before = await counts();
    const files: [string, Buffer][] = Array.from({ length: 9 }, (_, i) => [
      `ok-${i}.json`,
      calcFile(`SP-${i}`),
    ]);
    files.splice(4, 0, ['bad.json', badFile()]);
    const res = await upload(consultant, files, 'Ten files, one bad');
    expect(res.status).toBe(422);
    expect(res.body).toMatchObject({
      statusCode: 422,
      error: 'Unprocessable Entity',
      message: expect.stringContaining('1 of 10'),
    });
    const details = res.body.details as {
      file: string;
      pointer: string;
      line: number;
      column: number;
      rule: string;
      message: string;
    }[];
    expect(details.length).toBeGreaterThanOrEqual(2);
    for (const d of details) {
      expect(d).toEqual({
        file: 'bad.json',
        pointer: expect.any(String),
        line: expect.any(Number),
        column: expect.any(Number),
        rule: expect.any(String),
        message: expect.any(String),
      });
    }
    expect(details.map((d) => d.rule)).toEqual(expect.arrayContaining(['required']));
    expect(details.some((d) => d.pointer.startsWith('/members/0/holes/0'))).toBe(true);
    expect(await counts()).toEqual(before);
  });

  it('reports the errors of every invalid file, not just the first', async () => {
    const res = await upload(consultant, [
      ['a.json', badFile()],
      ['b.json', Buffer.from('{ "format": ')],
      ['c.json', calcFile('SP-C')],
    ]);
    expect(res.status).toBe(422);
    const files = new Set((res.body.details as { file: string }[]).map((d) => d.file));
    expect([...files].sort()).toEqual(['a.json', 'b.json']);
    expect(
      (res.body.details as { file: string; rule: string }[]).find((d) => d.file === 'b.json')?.rule,
    ).toBe('json-syntax');
  });

  it('a valid submittal stores files, results and discrepancies together and answers the summary', async () => {
    const before = await counts();
    const overstated = calcFile('SP-OVER', { claims: { An: 6.0 } });
    const files: [string, Buffer][] = [
      ['over.json', overstated],
      ...Array.from({ length: 9 }, (_, i): [string, Buffer] => [`ok-${i}.json`, calcFile(`SP-${i}`)]),
    ];
    const res = await upload(consultant, files, 'Ten good files');
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      projectId: 1,
      title: 'Ten good files',
      revisionOfId: null,
      webPath: `/submittals/${res.body.submittalId}`,
      webUrl: `http://ligament.test/submittals/${res.body.submittalId}`,
      summary: { files: 10, members: 10 },
    });
    // 12 − 2 × (13/16 + 1/16) = 10.25 in; An = 5.125 in² (AISC 360 B4.3b hole width, hand-checked): 6.0 is overstated.
    expect(res.body.summary.worst).toMatchObject({
      code: 'LG101',
      class: 'overstated',
      severity: 'error',
      fileName: 'over.json',
      memberId: 'SP-OVER',
    });
    expect(res.body.summary.bySeverity.error).toBeGreaterThanOrEqual(1);
    const after = await counts();
    expect(after.submittals).toBe(before.submittals! + 1);
    expect(after.calc_files).toBe(before.calc_files! + 10);
    expect(after.member_results).toBe(before.member_results! + 10);
    expect(after.discrepancies).toBe(before.discrepancies! + res.body.summary.findings);
    expect(after.mail_outbox).toBeGreaterThan(before.mail_outbox!);

    const id = res.body.submittalId as number;
    const listed = await request(t.http).get(`/api/submittals/${id}/files`).set(bearer(checker));
    const over = (listed.body as { id: number; fileName: string; sha256: string }[]).find(
      (f) => f.fileName === 'over.json',
    );
    expect(over?.sha256).toBe(createHash('sha256').update(overstated).digest('hex'));
    const raw = await request(t.http)
      .get(`/api/calc-files/${over?.id}/content`)
      .set(bearer(checker))
      .buffer(true)
      .parse((r, cb) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => cb(null, Buffer.concat(chunks)));
      });
    expect(Buffer.compare(raw.body as Buffer, overstated)).toBe(0);

    const results = await request(t.http).get(`/api/submittals/${id}/results`).set(bearer(checker));
    const r = (
      results.body as {
        memberId: string;
        An: number;
        engineVersion: string;
        inputsHash: string;
        directions: { governing: { holes: string[] } }[];
      }[]
    ).find((x) => x.memberId === 'SP-OVER');
    expect(r?.An).toBeCloseTo(5.125, 6);
    expect(r?.directions[0]?.governing.holes).toEqual(['A1', 'B1']);
    expect(r?.inputsHash).toMatch(/^[0-9a-f]{64}$/);
    const detail = await request(t.http).get(`/api/submittals/${id}`).set(bearer(checker));
    expect(detail.body.summary).toEqual(res.body.summary);
    expect(detail.body.status).toBe('checked');
  });
});

describe('block shear in the governing strength', () => {
  it('stores block shear as the governing available strength and the report names it', async () => {
    // By hand (AISC 360 J4.3, common practice): 12 × 1/2 plate, holes at y = 3 and 9, end distance
    // 1.5 in: Agv 1.5, Anv 1.0625, Ant 2.5625 in²; φRn = 0.75 (min(36.98, 32.4) + 148.63) = 135.77 kip,
    // below yielding 194.4 and rupture 222.9 kip. A claim of it is no finding.
    const file = calcFile('SP-BS', {
      blockShear: { endDistance: 1.5 },
      claims: { An: 5.125, blockShear: 135.77, available: 135.77 },
    });
    const res = await upload(consultant, [['bs.json', file]], 'Block shear governs');
    expect(res.status).toBe(201);
    expect(res.body.summary.findings).toBe(0);
    const id = res.body.submittalId as number;
    const results = await request(t.http).get(`/api/submittals/${id}/results`).set(bearer(checker));
    expect(results.status).toBe(200);
    const member = (
      results.body as { memberId: string; available: number; result: { governing: { limitState: string } } }[]
    ).find((r) => r.memberId === 'SP-BS')!;
    expect(member.available).toBeCloseTo(0.75 * (32.4 + 58 * 2.5625), 6);
    expect(member.result.governing.limitState).toBe('block shear');
    const report = await request(t.http).get(`/api/submittals/${id}/report`).set(bearer(checker));
    expect(report.status).toBe(200);
    expect(report.text).toContain('<small>block shear</small>');
  });
});

describe('upload limits', () => {
  it('answers 413 for a file over the per-file limit', async () => {
    const res = await upload(consultant, [['big.json', padded('SP-BIG', 25_000)]]);
    expect(res.status).toBe(413);
    expect(res.body.statusCode).toBe(413);
  });

  it('answers 400 for more files than allowed', async () => {
    const files = Array.from({ length: 13 }, (_, i): [string, Buffer] => [
      `f-${i}.json`,
      calcFile(`SP-${i}`),
    ]);
    const res = await upload(consultant, files);
    expect(res.status).toBe(400);
  });

  it('answers 413 when the files together exceed the total limit, and stores nothing', async () => {
    const before = await counts();
    const files = Array.from({ length: 4 }, (_, i): [string, Buffer] => [
      `p-${i}.json`,
      padded(`SP-P${i}`, 18_000),
    ]);
    const res = await upload(consultant, files);
    expect(res.status).toBe(413);
    expect(res.body.message).toContain('60000');
    expect(await counts()).toEqual(before);
  });

  it('refuses files that are not .json with a CalcError naming the rule', async () => {
    const res = await upload(consultant, [
      ['calc.txt', calcFile()],
      ['ok.json', calcFile('SP-OK')],
    ]);
    expect(res.status).toBe(422);
    expect(res.body.details).toEqual([
      expect.objectContaining({ file: 'calc.txt', rule: 'file-extension', pointer: '' }),
    ]);
  });

  it('refuses an upload without files, and without a title', async () => {
    expect((await upload(consultant, [])).status).toBe(400);
    const noTitle = await request(t.http)
      .post('/api/projects/1/submittals')
      .set(bearer(consultant))
      .attach('files', calcFile(), 'a.json');
    expect(noTitle.status).toBe(400);
    expect(noTitle.body.details).toEqual(
      expect.arrayContaining([expect.objectContaining({ property: 'title' })]),
    );
  });

  it('refuses a revision of a submittal of another project', async () => {
    const other = await request(t.http).post('/api/projects').set(bearer(admin)).send({ name: 'Other' });
    await request(t.http)
      .post(`/api/projects/${other.body.id}/members`)
      .set(bearer(admin))
      .send({ userId: 2 });
    const there = await upload(consultant, [['x.json', calcFile()]], 'Elsewhere', undefined, other.body.id);
    expect(there.status).toBe(201);
    const res = await upload(
      consultant,
      [['y.json', calcFile()]],
      'Cross-project revision',
      there.body.submittalId,
    );
    expect(res.status).toBe(422);
  });
});

describe('revision diff and recheck (seeded issue A → issue B)', () => {
  it('pairs files by name, then by member ids, and diffs their canonical JSON', async () => {
    const res = await request(t.http).get('/api/submittals/2/diff').set(bearer(checker));
    expect(res.status).toBe(200);
    expect(res.body.previousSubmittalId).toBe(1);
    const byFile = new Map(
      (
        res.body.files as {
          currentFile: string;
          change: string;
          matchedBy: string;
          previousFile: string;
          patch: string;
        }[]
      ).map((f) => [f.currentFile, f]),
    );
    expect(byFile.get('dc-splice-north.json')).toMatchObject({ change: 'changed', matchedBy: 'file-name' });
    expect(byFile.get('gusset-g2-issue-b.json')).toMatchObject({
      change: 'changed',
      matchedBy: 'member-ids',
      previousFile: 'gusset-g2.json',
    });
    expect(byFile.get('dc-splice-south.json')).toMatchObject({ change: 'unchanged', patch: '' });
    // Issue B does not reissue the hanger's file (its items stay with issue A).
    const removed = (res.body.files as { change: string; previousFile: string }[]).filter(
      (f) => f.change === 'removed',
    );
    expect(removed.map((f) => f.previousFile)).toEqual(['hanger-h1.json']);
    const north = byFile.get('dc-splice-north.json')?.patch ?? '';
    expect(north).toContain('--- a/dc-splice-north.json');
    expect(north).toMatch(/^-\s+"An": 6\.125,?$/m);
    expect(north).toMatch(/^\+\s+"An": 5\.508,?$/m);
  });

  it('lists the same changes by meaning: claims old → new with units, and nothing for an unchanged file', async () => {
    const res = await request(t.http).get('/api/submittals/2/diff').set(bearer(checker));
    type Change = {
      scope: string;
      change: string;
      memberId?: string;
      field?: string;
      before?: string;
      after?: string;
    };
    const files = res.body.files as { currentFile: string | null; changes: Change[] | null }[];
    const north = files.find((f) => f.currentFile === 'dc-splice-north.json')?.changes ?? [];
    // The seeded files (api/src/seed/calc/rev-a and rev-b): issue B claims the zigzag chain and its An.
    expect(north).toEqual(
      expect.arrayContaining([
        {
          scope: 'claim',
          change: 'changed',
          memberId: 'SP-N1',
          field: 'claims.An',
          label: 'claimed An',
          before: '6.125 in²',
          after: '5.508 in²',
        },
        {
          scope: 'claim',
          change: 'changed',
          memberId: 'SP-N1',
          field: 'claims.controllingChain',
          label: 'claimed controlling chain',
          before: 'A1–C1 (−x)',
          after: 'A1–B1–C1–D1 (−x)',
        },
      ]),
    );
    expect(files.find((f) => f.currentFile === 'dc-splice-south.json')?.changes).toEqual([]);
  });

  it('says which discrepancies the revision resolved (closed), carried on (kept) and raised anew (opened)', async () => {
    const res = await request(t.http).get('/api/submittals/2/diff').set(bearer(checker));
    const key = (d: { code: string; memberId: string }) => `${d.code} ${d.memberId}`;
    const closed = (res.body.closed as { code: string; memberId: string }[]).map(key);
    const opened = (res.body.opened as { code: string; memberId: string }[]).map(key);
    const kept = (res.body.kept as { previous: { code: string; memberId: string } }[]).map((k) =>
      key(k.previous),
    );
    expect(closed).toEqual(
      expect.arrayContaining(['LG101 SP-N1', 'LG121 SP-N1', 'LG122 G-2', 'LG124 G-2', 'LG142 B-L2']),
    );
    expect(opened).toEqual(expect.arrayContaining(['LG101 T-1', 'LG102 T-1', 'LG103 T-1']));
    expect(kept).toEqual(expect.arrayContaining(['LG124 SP-S1', 'LG111 SP-S1', 'LG112 G-2']));
    expect(kept.some((k) => k.endsWith('H-1'))).toBe(false);
    expect(closed.filter((k) => kept.includes(k))).toEqual([]);
  });

  it('holds discrepancies of every finding class in the demo', async () => {
    const { FINDING_CATALOGUE } = await import('ligament');
    const classes = new Set<string>();
    for (const submittalId of [1, 2]) {
      const res = await request(t.http)
        .get(`/api/projects/1/discrepancies?submittalId=${submittalId}&pageSize=500&includeSuperseded=true`)
        .set(bearer(checker));
      for (const d of res.body.items as { class: string }[]) classes.add(d.class);
    }
    expect([...classes].sort()).toEqual([...new Set(FINDING_CATALOGUE.map((f) => f.class))].sort());
  });

  it('answers 409 for the diff of a submittal that revises nothing', async () => {
    const res = await request(t.http).get('/api/submittals/1/diff').set(bearer(checker));
    expect(res.status).toBe(409);
  });

  it('rechecks with the current engine and reports no change when nothing changed', async () => {
    const stored = await request(t.http)
      .get('/api/projects/1/discrepancies?submittalId=1&pageSize=1&includeSuperseded=true')
      .set(bearer(checker));
    const res = await request(t.http).post('/api/submittals/1/recheck').set(bearer(checker));
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({
      submittalId: 1,
      changed: false,
      valueChanges: [],
      newFindings: [],
      goneFindings: [],
      loadErrors: [],
    });
    expect(res.body.currentEngineVersion).toBe(res.body.storedEngineVersion);
    expect(res.body.unchangedFindings).toBe(stored.body.total);
    const events = await request(t.http).get('/api/submittals/1/events?pageSize=500').set(bearer(checker));
    expect((events.body.items as { type: string }[]).map((e) => e.type)).toContain('submittal.rechecked');
  });
});

describe('API token scope', () => {
  let token: string;
  let tokenId: number;

  it('is shown once and stored only as a hash', async () => {
    const res = await request(t.http)
      .post('/api/tokens')
      .set(bearer(consultant))
      .send({ name: 'CI', projectId: 1 });
    expect(res.status).toBe(201);
    token = res.body.token;
    tokenId = res.body.id;
    expect(token).toMatch(/^lgt_/);
    const list = await request(t.http).get('/api/tokens').set(bearer(consultant));
    expect(JSON.stringify(list.body)).not.toContain(token);
    const [rows] = await t.app
      .get(Sequelize)
      .query('SELECT tokenHash FROM api_tokens WHERE id = ?', { replacements: [tokenId] });
    expect((rows as { tokenHash: string }[])[0]?.tokenHash).toBe(
      createHash('sha256').update(token).digest('hex'),
    );
  });

  it('uploads and reads its project', async () => {
    const up = await upload(token, [['ci.json', calcFile('SP-CI')]], 'From CI');
    expect(up.status).toBe(201);
    const s = await request(t.http).get(`/api/submittals/${up.body.submittalId}`).set(bearer(token));
    expect(s.body).toMatchObject({ viaApiToken: true, submittedBy: 'Priya Halvorsen' });
    expect((await request(t.http).get('/api/projects/1/discrepancies').set(bearer(token))).status).toBe(200);
    expect(
      (await request(t.http).get('/api/projects').set(bearer(token))).body.map((p: { id: number }) => p.id),
    ).toEqual([1]);
  });

  it('does nothing else: no other project, no moves, no stamps, no admin, no new tokens', async () => {
    expect((await request(t.http).get('/api/projects/2').set(bearer(token))).status).toBe(403);
    expect(
      (
        await request(t.http)
          .post('/api/submittals/1/stamp')
          .set(bearer(token))
          .send({ action: 'rejected', comment: 'x' })
      ).status,
    ).toBe(403);
    expect(
      (
        await request(t.http)
          .post('/api/discrepancies/1/transitions')
          .set(bearer(token))
          .send({ to: 'answered', note: 'x' })
      ).status,
    ).toBe(403);
    expect(
      (await request(t.http).post('/api/tokens').set(bearer(token)).send({ name: 'x', projectId: 1 })).status,
    ).toBe(403);
    expect((await request(t.http).get('/api/users').set(bearer(token))).status).toBe(403);
  });

  it('cannot be made for a project the consultant is not on', async () => {
    const project = await request(t.http)
      .post('/api/projects')
      .set(bearer(admin))
      .send({ name: 'Not Priya’s' });
    const res = await request(t.http)
      .post('/api/tokens')
      .set(bearer(consultant))
      .send({ name: 'x', projectId: project.body.id });
    expect(res.status).toBe(403);
  });

  it('is what `ligament submit` uses: summary and web address out, exit codes as check', async () => {
    // The command's runner from the CLI sources (not part of the package's exports; outside this
    // workspace's type-check, so typed here by hand).
    const cliSubmit = '../../cli/src/commands/submit.js';
    const { runSubmit } = (await import(cliSubmit)) as {
      runSubmit: (
        req: object,
        fetchImpl: (url: string, init: RequestInit) => Promise<Response>,
      ) => Promise<{ stdout: string; stderr: string; exitCode: number }>;
    };
    await t.app.listen(0, '127.0.0.1');
    const server = await t.app.getUrl();
    const base = { server, token, projectId: 1, title: 'CLI', format: 'text' as const };
    const files = [{ name: 'cli.json', text: calcFile('SP-CLI', { claims: { An: 6.0 } }).toString() }];
    const failing = await runSubmit({ ...base, failOn: 'overstated', files }, (url, init) =>
      fetch(url, init),
    );
    expect(failing.exitCode).toBe(1);
    expect(failing.stdout).toMatch(/Submittal \d+ "CLI" checked/);
    expect(failing.stdout).toContain('worst: LG101 error (cli.json SP-CLI)');
    expect(failing.stdout).toMatch(/http:\/\/ligament\.test\/submittals\/\d+/);
    const lenient = await runSubmit({ ...base, failOn: 'none', files }, (url, init) => fetch(url, init));
    expect(lenient.exitCode).toBe(0);
    const invalid = await runSubmit(
      { ...base, failOn: 'none', files: [{ name: 'bad.json', text: '{' }] },
      (url, init) => fetch(url, init),
    );
    expect(invalid.exitCode).toBe(2);
    expect(invalid.stderr).toContain('bad.json:1:');
    const wrong = await runSubmit({ ...base, token: 'lgt_wrong', failOn: 'none', files }, (url, init) =>
      fetch(url, init),
    );
    expect(wrong).toMatchObject({ exitCode: 2, stderr: expect.stringContaining('401') });
  });

  it('stops working once revoked', async () => {
    const res = await request(t.http).delete(`/api/tokens/${tokenId}`).set(bearer(consultant));
    expect(res.body.revokedAt).toEqual(expect.any(String));
    const after = await request(t.http).get('/api/projects/1').set(bearer(token));
    expect(after.status).toBe(401);
  });
});
