import { Sequelize } from 'sequelize-typescript';
import request from 'supertest';
import { DiscrepancyRevisionsService } from '../src/discrepancies/discrepancy-revisions.service.js';
import { bearer, bootApp, calcFile, EMAIL, login, type TestApp } from './helpers.js';

/**
 * Discrepancies carried across revisions (api/README.md, "Revisions"; identity in
 * src/discrepancies/discrepancy-identity.ts): what a revision fixes is resolved, what it still raises
 * is carried on with its history, and only current items are counted.
 */
let t: TestApp;
const tok = { admin: '', consultant: '', checker: '', owner: '' };

type Item = {
  id: number;
  submittalId: number;
  memberId: string | null;
  fileName: string;
  code: string;
  severity: string;
  status: string;
  current: boolean;
  supersededBySubmittalId: number | null;
  carriedFromId: number | null;
};

async function upload(title: string, files: [string, Buffer][], revisionOf?: number): Promise<number> {
  let req = request(t.http)
    .post('/api/projects/1/submittals')
    .set(bearer(tok.consultant))
    .field('title', title);
  if (revisionOf !== undefined) req = req.field('revisionOf', String(revisionOf));
  for (const [name, content] of files) req = req.attach('files', content, name);
  const res = await req;
  expect(res.status).toBe(201);
  return res.body.submittalId as number;
}

async function items(query: string): Promise<Item[]> {
  const res = await request(t.http)
    .get(`/api/projects/1/discrepancies?pageSize=500&${query}`)
    .set(bearer(tok.checker));
  expect(res.status).toBe(200);
  return res.body.items as Item[];
}

const one = (list: Item[], memberId: string, code?: string) => {
  const found = list.filter((d) => d.memberId === memberId && (!code || d.code === code));
  expect({ memberId, code, found: found.length }).toEqual({ memberId, code, found: 1 });
  return found[0] as Item;
};

function move(who: keyof typeof tok, id: number, body: object) {
  return request(t.http).post(`/api/discrepancies/${id}/transitions`).set(bearer(tok[who])).send(body);
}

const closeHoles = (extra: object[] = []) => ({
  holes: [...extra, { id: 'A1', x: 0, y: 3, bolt: '3/4' }, { id: 'B1', x: 0, y: 4.5, bolt: '3/4' }],
});

/** Open current items by hand, from every item of project 1. */
async function openByHand(): Promise<number> {
  const all = await items('includeSuperseded=true');
  return all.filter((d) => d.current && ['raised', 'answered', 'returned'].includes(d.status)).length;
}

beforeAll(async () => {
  t = await bootApp();
  tok.admin = await login(t.http, EMAIL.admin);
  tok.consultant = await login(t.http, EMAIL.consultant);
  tok.checker = await login(t.http, EMAIL.checker);
  tok.owner = await login(t.http, EMAIL.owner);
});
afterAll(async () => t.close());

describe('a revision of a submittal', () => {
  let a = 0;
  let b = 0;
  let before: Item[] = [];
  let after: Item[] = [];

  beforeAll(async () => {
    a = await upload('Revision flow, issue A', [
      ['fix.json', calcFile('RV-FIX', { claims: { An: 6.0 } })],
      ['keep.json', calcFile('RV-KEEP', { claims: { An: 6.0 } })],
      ['acc.json', calcFile('RV-ACC', { claims: { An: 4.0 } })],
      ['acc2.json', calcFile('RV-ACC2', { claims: { An: 4.0 } })],
      ['ren.json', calcFile('RV-REN', { claims: { An: 6.0 } })],
      ['id.json', calcFile('RV-ID', { claims: { An: 6.0 } })],
      ['part.json', calcFile('RV-PART', { claims: { An: 6.0 } })],
      ['hole.json', calcFile('RV-HOLE', closeHoles())],
    ]);
    before = await items(`submittalId=${a}`);
    const keep = one(before, 'RV-KEEP', 'LG101');
    expect(
      (await move('consultant', keep.id, { to: 'answered', note: 'Claim kept: see the test.' })).status,
    ).toBe(200);
    await request(t.http)
      .post(`/api/discrepancies/${keep.id}/comments`)
      .set(bearer(tok.checker))
      .send({ body: 'Which test?' })
      .expect(201);
    for (const member of ['RV-ACC', 'RV-ACC2']) {
      const d = one(before, member, 'LG111');
      await move('consultant', d.id, { to: 'answered', note: 'Conservative.' }).expect(200);
      await move('checker', d.id, { to: 'accepted' }).expect(200);
    }
    await move('checker', one(before, 'RV-HOLE', 'LG201').id, { to: 'waived', note: 'Agreed.' }).expect(200);

    b = await upload(
      'Revision flow, issue B',
      [
        ['fix.json', calcFile('RV-FIX')],
        ['keep.json', calcFile('RV-KEEP', { claims: { An: 6.0 } })],
        ['acc.json', calcFile('RV-ACC', { claims: { An: 4.0 } })],
        ['acc2.json', calcFile('RV-ACC2', { claims: { An: 4.5 } })],
        ['ren-issue-b.json', calcFile('RV-REN', { claims: { An: 6.0 } })],
        ['id.json', calcFile('RV-ID2', { claims: { An: 6.0 } })],
        // part.json is not reissued.
        ['hole.json', calcFile('RV-HOLE', closeHoles([{ id: 'C0', x: 4, y: 9, bolt: '3/4' }]))],
      ],
      a,
    );
    after = await items(`includeSuperseded=true&submittalId=${a}`);
  });

  it('resolves what it fixed, with the reason "resolved by #N", an event in history and the activity log', async () => {
    const fixed = one(after, 'RV-FIX', 'LG101');
    expect(fixed).toMatchObject({ status: 'resolved', current: false, supersededBySubmittalId: b });
    const detail = await request(t.http).get(`/api/discrepancies/${fixed.id}`).set(bearer(tok.checker));
    expect(detail.body.resolution).toBe(`resolved by #${b}`);
    expect(detail.body.allowedMoves).toEqual([]);
    expect(detail.body.history.at(-1)).toMatchObject({
      type: 'discrepancy.resolved',
      actor: null,
      data: { from: 'raised', to: 'resolved', reason: `resolved by #${b}`, revisionSubmittalId: b },
    });
    const log = await request(t.http).get('/api/projects/1/events?pageSize=500').set(bearer(tok.owner));
    expect(log.body.items).toEqual(
      expect.arrayContaining([
        expect.objectContaining({ type: 'discrepancy.resolved', discrepancyId: fixed.id }),
        expect.objectContaining({
          type: 'submittal.revised',
          submittalId: b,
          data: expect.objectContaining({ carried: 5, resolved: 2, reRaised: 1, notRevised: 1 }),
        }),
      ]),
    );
  });

  it('carries on what it still raises: status, history and comments go with it', async () => {
    const old = one(after, 'RV-KEEP', 'LG101');
    expect(old).toMatchObject({ status: 'answered', current: false, supersededBySubmittalId: b });
    const now = one(await items(`submittalId=${b}`), 'RV-KEEP', 'LG101');
    expect(now).toMatchObject({ status: 'answered', current: true, carriedFromId: old.id });
    const detail = await request(t.http).get(`/api/discrepancies/${now.id}`).set(bearer(tok.checker));
    expect(detail.body.lineage.map((l: { id: number }) => l.id)).toEqual([old.id, now.id]);
    expect(detail.body.history.map((e: { type: string }) => e.type)).toEqual([
      'discrepancy.answered',
      'discrepancy.commented',
      'discrepancy.carried',
    ]);
    expect(detail.body.comments).toEqual([
      expect.objectContaining({ body: 'Which test?', discrepancyId: old.id }),
    ]);
    // The checker decides on the carried item, not the old one.
    expect(detail.body.allowedMoves).toEqual(['accepted', 'returned', 'waived']);
    const oldDetail = await request(t.http).get(`/api/discrepancies/${old.id}`).set(bearer(tok.checker));
    expect(oldDetail.body.carriedInto).toMatchObject({ id: now.id, submittalId: b });
    const refused = await move('checker', old.id, { to: 'accepted' });
    expect(refused.status).toBe(409);
    expect(refused.body.message).toMatch(new RegExp(`superseded by submittal #${b}`));
  });

  it('keeps an accepted item accepted while its numbers are the same, and raises it again when they changed', async () => {
    const inB = await items(`submittalId=${b}`);
    expect(one(inB, 'RV-ACC', 'LG111').status).toBe('accepted');
    const again = one(inB, 'RV-ACC2', 'LG111');
    expect(again.status).toBe('raised');
    const detail = await request(t.http).get(`/api/discrepancies/${again.id}`).set(bearer(tok.checker));
    expect(detail.body.history.at(-1)).toMatchObject({
      type: 'discrepancy.carried',
      data: { from: 'accepted', to: 'raised', reason: expect.stringMatching(/^was accepted at claimed 4 /) },
    });
  });

  it('recognises a renamed file by its members, and a hole by its id when another is added before it', async () => {
    const inB = await items(`submittalId=${b}`);
    const renamed = one(inB, 'RV-REN', 'LG101');
    expect(renamed).toMatchObject({ fileName: 'ren-issue-b.json', status: 'raised' });
    expect(renamed.carriedFromId).toBe(one(after, 'RV-REN', 'LG101').id);
    const hole = one(inB, 'RV-HOLE', 'LG201');
    expect(hole).toMatchObject({ status: 'waived', carriedFromId: one(after, 'RV-HOLE', 'LG201').id });
  });

  it('takes a member whose id changed for another member: the old item resolved, the new one raised', () => {
    expect(one(after, 'RV-ID', 'LG101')).toMatchObject({ status: 'resolved', current: false });
  });

  it('leaves the items of a file it does not reissue current where they are', async () => {
    expect(one(after, 'RV-PART', 'LG101')).toMatchObject({ status: 'raised', current: true });
    const inB = await items(`submittalId=${b}`);
    expect(inB.some((d) => d.memberId === 'RV-PART')).toBe(false);
    expect((await items(`submittalId=${b}`)).find((d) => d.memberId === 'RV-ID2')).toMatchObject({
      status: 'raised',
      carriedFromId: null,
    });
  });

  it('counts only current items: list, dashboard, project, submittal and tallies agree', async () => {
    const open = await openByHand();
    const list = await request(t.http)
      .get('/api/projects/1/discrepancies?status=open&pageSize=1')
      .set(bearer(tok.owner));
    expect(list.body.total).toBe(open);
    const dashboard = await request(t.http).get('/api/dashboard?projectId=1').set(bearer(tok.owner));
    expect(dashboard.body.openTotal).toBe(open);
    expect(dashboard.body.superseded).toBeGreaterThanOrEqual(8);
    expect(dashboard.body.projects[0]).toMatchObject({ id: 1, open });
    const project = await request(t.http).get('/api/projects/1').set(bearer(tok.owner));
    expect(project.body.openDiscrepancyCount).toBe(open);
    const subA = await request(t.http).get(`/api/submittals/${a}`).set(bearer(tok.owner));
    expect(subA.body.openDiscrepancies).toBe(1);
    const subB = await request(t.http).get(`/api/submittals/${b}`).set(bearer(tok.owner));
    expect(subB.body.openDiscrepancies).toBe(4);
    const trendA = (dashboard.body.trend as { submittalId: number; raised: number; open: number }[]).find(
      (p) => p.submittalId === a,
    );
    expect(trendA).toMatchObject({ raised: before.length, open: 1 });
  });

  it('blocks a stamp only on the current open errors of that submittal', async () => {
    const stampA = await request(t.http)
      .post(`/api/submittals/${a}/stamp`)
      .set(bearer(tok.checker))
      .send({ action: 'no-exceptions-taken', comment: 'x' });
    expect(stampA.status).toBe(409);
    expect(stampA.body.details.map((d: { memberId: string }) => d.memberId)).toEqual(['RV-PART']);
    const stampB = await request(t.http)
      .post(`/api/submittals/${b}/stamp`)
      .set(bearer(tok.checker))
      .send({ action: 'no-exceptions-taken', comment: 'x' });
    expect(stampB.status).toBe(409);
    expect(stampB.body.details.map((d: { memberId: string }) => d.memberId).sort()).toEqual([
      'RV-ID2',
      'RV-KEEP',
      'RV-REN',
    ]);
  });

  it('says in the revision diff what it resolved, carried on and raised anew', async () => {
    const diff = await request(t.http).get(`/api/submittals/${b}/diff`).set(bearer(tok.checker));
    const members = (list: { memberId: string }[]) => list.map((d) => d.memberId).sort();
    expect(members(diff.body.closed)).toEqual(['RV-FIX', 'RV-ID']);
    expect(members(diff.body.opened)).toEqual(['RV-ID2']);
    expect(members(diff.body.kept.map((k: { current: { memberId: string } }) => k.current))).toEqual([
      'RV-ACC',
      'RV-ACC2',
      'RV-HOLE',
      'RV-KEEP',
      'RV-REN',
    ]);
  });

  it('carries on from earlier submittals of the lineage too: a file left out of B and reissued in C', async () => {
    const c = await upload('Revision flow, issue C', [['part.json', calcFile('RV-PART')]], b);
    const part = one(await items(`includeSuperseded=true&submittalId=${a}`), 'RV-PART', 'LG101');
    expect(part).toMatchObject({ status: 'resolved', supersededBySubmittalId: c });
    // B's items are untouched by C: C does not hold their files.
    expect((await items(`submittalId=${b}`)).every((d) => d.current)).toBe(true);
  });
});

describe('the list', () => {
  it('searches free text across message, member, file and code, and finds "#id"', async () => {
    const hits = await items('q=rv-keep&includeSuperseded=true');
    expect(hits.length).toBe(2);
    expect(hits.every((d) => d.memberId === 'RV-KEEP')).toBe(true);
    const byId = await items(`q=%23${hits[0]?.id}&includeSuperseded=true`);
    expect(byId.map((d) => d.id)).toContain(hits[0]?.id);
    expect(await items('q=nothing-like-this-anywhere')).toEqual([]);
  });

  it('exports the filtered list as CSV: BOM, header, units columns, every page', async () => {
    const res = await request(t.http)
      .get('/api/projects/1/discrepancies.csv?q=RV-&includeSuperseded=true&sort=id')
      .set(bearer(tok.owner))
      .buffer(true)
      .parse((r, done) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => done(null, Buffer.concat(chunks)));
      });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(res.headers['content-disposition']).toBe('attachment; filename="discrepancies-project-1.csv"');
    const bytes = res.body as Buffer;
    expect([...bytes.subarray(0, 3)]).toEqual([0xef, 0xbb, 0xbf]);
    const lines = bytes.toString('utf8').slice(1).split('\r\n');
    const header = (lines[0] ?? '').split(',').map((h) => JSON.parse(h) as string);
    expect(header).toEqual(
      expect.arrayContaining(['quantity', 'claimed', 'recomputed', 'unit', 'unit_system']),
    );
    const all = await items('q=RV-&includeSuperseded=true');
    expect(lines.length).toBe(all.length + 2); // header, rows, the empty string after the last CRLF
    const row = (lines.find((l) => l.includes('"RV-FIX"')) ?? '').match(/("([^"]|"")*"|[^,]*)(,|$)/g) ?? [];
    const cell = (name: string) => row[header.indexOf(name)]?.replace(/,$/, '');
    expect(cell('quantity')).toBe('"An"');
    expect(cell('claimed')).toBe('6');
    expect(cell('recomputed')).toBe('5.125');
    expect(cell('unit')).toBe('"in²"');
    expect(cell('unit_system')).toBe('"in"');
    expect(cell('status')).toBe('"resolved"');
  });

  it('keeps the dashboard CSV to current open items, with a BOM and the unit columns', async () => {
    const res = await request(t.http)
      .get('/api/dashboard/open-discrepancies.csv?projectId=1')
      .set(bearer(tok.owner));
    expect(res.text.charCodeAt(0)).toBe(0xfeff);
    expect(res.text).toContain('"unit","unit_system"');
    expect(res.text.split('\r\n').length - 2).toBe(await openByHand());
  });
});

describe('revisions stored before carrying existed', () => {
  it('are carried across once at start-up, oldest first', async () => {
    const c = await upload('Backfill, issue C', [
      ['bf-fix.json', calcFile('BF-FIX', { claims: { An: 6.0 } })],
      ['bf-keep.json', calcFile('BF-KEEP', { claims: { An: 6.0 } })],
    ]);
    const d = await upload(
      'Backfill, issue D',
      [
        ['bf-fix.json', calcFile('BF-FIX')],
        ['bf-keep.json', calcFile('BF-KEEP', { claims: { An: 6.0 } })],
      ],
      c,
    );
    // As a database from before migration 0005 holds them: nothing carried, nothing superseded.
    const db = t.app.get(Sequelize);
    await db.query(
      `UPDATE discrepancies SET status = 'raised', supersededBySubmittalId = NULL, version = 0 WHERE submittalId = ${c}`,
    );
    await db.query(`UPDATE discrepancies SET carriedFromId = NULL WHERE submittalId = ${d}`);
    await db.query(`UPDATE submittals SET reconciled = 0 WHERE id = ${d}`);
    expect((await items(`submittalId=${c}`)).length).toBe(2);

    await t.app.get(DiscrepancyRevisionsService).onApplicationBootstrap();
    const inC = await items(`includeSuperseded=true&submittalId=${c}`);
    expect(one(inC, 'BF-FIX')).toMatchObject({ status: 'resolved', supersededBySubmittalId: d });
    expect(one(inC, 'BF-KEEP')).toMatchObject({ current: false, supersededBySubmittalId: d });
    expect(one(await items(`submittalId=${d}`), 'BF-KEEP').carriedFromId).toBe(one(inC, 'BF-KEEP').id);
    // Once only: a second start finds nothing to do.
    await t.app.get(DiscrepancyRevisionsService).onApplicationBootstrap();
    expect((await items(`includeSuperseded=true&submittalId=${c}`)).map((x) => x.status)).toEqual(
      inC.map((x) => x.status),
    );
  });
});
