import type { AddressInfo } from 'node:net';
import request from 'supertest';
import { bearer, bootApp, calcFile, EMAIL, login, readDatabase, type TestApp } from './helpers.js';

/**
 * Real parallel requests against a file database: the app listens on a port and every request of a
 * Promise.all is in flight at the same time, so the service (not the test) decides their order.
 */
let t: TestApp;
let base = '';
const tok = { admin: '', consultant: '', checker: '' };

const sql = <T>(query: string, params: (string | number)[] = []) => readDatabase<T>(t, query, params);

function upload(tag: string, claims: Record<string, unknown> = { An: 6.0 }) {
  return request(base)
    .post('/api/projects/1/submittals')
    .set(bearer(tok.consultant))
    .field('title', `Parallel ${tag}`)
    .attach('files', calcFile(`SP-${tag}`, { claims }), `${tag}.json`);
}

function move(who: keyof typeof tok, id: number, body: object) {
  return request(base).post(`/api/discrepancies/${id}/transitions`).set(bearer(tok[who])).send(body);
}

/** A fresh discrepancy of project 1, moved to answered by the consultant. */
async function answeredDiscrepancy(tag: string): Promise<{ id: number; submittalId: number }> {
  const res = await upload(tag);
  expect(res.status).toBe(201);
  const list = await request(base)
    .get(`/api/projects/1/discrepancies?submittalId=${res.body.submittalId}`)
    .set(bearer(tok.checker));
  const id = (list.body.items as { id: number }[])[0]?.id as number;
  expect((await move('consultant', id, { to: 'answered', note: 'Checked again.' })).status).toBe(200);
  return { id, submittalId: res.body.submittalId as number };
}

beforeAll(async () => {
  t = await bootApp();
  await t.app.listen(0, '127.0.0.1');
  base = `http://127.0.0.1:${(t.http.address() as AddressInfo).port}`;
  tok.admin = await login(t.http, EMAIL.admin);
  tok.consultant = await login(t.http, EMAIL.consultant);
  tok.checker = await login(t.http, EMAIL.checker);
});
afterAll(async () => t.close());

describe('two people acting on one discrepancy at once', () => {
  it('accept and return together: one wins, the other gets 409 with the current state, one event', async () => {
    const { id } = await answeredDiscrepancy('race-1');
    const [accept, ret] = await Promise.all([
      move('checker', id, { to: 'accepted', note: 'Fine.' }),
      move('checker', id, { to: 'returned', note: 'Show the chain.' }),
    ]);
    const statuses = [accept.status, ret.status].sort();
    expect(statuses).toEqual([200, 409]);
    const winner = accept.status === 200 ? accept : ret;
    const loser = accept.status === 200 ? ret : accept;
    expect(loser.body.details).toEqual([
      expect.objectContaining({ id, status: winner.body.status, version: expect.any(Number) }),
    ]);
    const fromAnswered = await sql<{ n: number }>(
      `SELECT count(*) AS n FROM events WHERE discrepancyId = ? AND json_extract(data, '$.from') = 'answered'`,
      [id],
    );
    expect(fromAnswered[0]?.n).toBe(1);
    const detail = await request(base).get(`/api/discrepancies/${id}`).set(bearer(tok.checker));
    expect(detail.body.status).toBe(winner.body.status);
  });

  it('the same move sent twice at once is made once', async () => {
    const { id } = await answeredDiscrepancy('race-2');
    const replies = await Promise.all(
      [1, 2, 3, 4].map(() => move('checker', id, { to: 'accepted', note: 'Fine.' })),
    );
    expect(replies.map((r) => r.status).sort()).toEqual([200, 409, 409, 409]);
    const accepted = await sql<{ n: number }>(
      `SELECT count(*) AS n FROM events WHERE discrepancyId = ? AND type = 'discrepancy.accepted'`,
      [id],
    );
    expect(accepted[0]?.n).toBe(1);
  });
});

describe('reopening, assigning and revising at once', () => {
  it('two reopens of one accepted item: one wins, the other gets 409 with the state that won; one mail', async () => {
    const { id } = await answeredDiscrepancy('reopen-race');
    expect((await move('checker', id, { to: 'accepted' })).status).toBe(200);
    const [a, b] = await Promise.all([
      move('checker', id, { to: 'returned', note: 'Reopened: first.' }),
      move('checker', id, { to: 'returned', note: 'Reopened: second.' }),
    ]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    const loser = a.status === 409 ? a : b;
    expect(loser.body.details).toEqual([expect.objectContaining({ id, status: 'returned' })]);
    expect(loser.body.message).toMatch(/^Someone else changed discrepancy #\d+ first: it is now Returned\./);
    const events = await sql<{ n: number }>(
      `SELECT count(*) AS n FROM events WHERE discrepancyId = ? AND type = 'discrepancy.reopened'`,
      [id],
    );
    expect(events[0]?.n).toBe(1);
    const mails = await sql<{ n: number }>(
      `SELECT count(*) AS n FROM mail_outbox WHERE kind = 'discrepancy-reopened' AND text LIKE ?`,
      [`%/discrepancies/${id}\n%`],
    );
    expect(mails[0]?.n).toBe(1);
  });

  it('two assignments at once: one is saved, the other gets 409; one event', async () => {
    const { id } = await answeredDiscrepancy('assign-race');
    const me = await request(base).get('/api/auth/me').set(bearer(tok.consultant));
    const assign = (dueDate: string) =>
      request(base)
        .patch(`/api/discrepancies/${id}/assignment`)
        .set(bearer(tok.checker))
        .send({ assigneeId: me.body.id, dueDate });
    const [a, b] = await Promise.all([assign('2026-12-18'), assign('2027-01-08')]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    const winner = a.status === 200 ? a : b;
    const detail = await request(base).get(`/api/discrepancies/${id}`).set(bearer(tok.checker));
    expect(detail.body.dueDate).toBe(winner.body.dueDate);
    const events = await sql<{ n: number }>(
      `SELECT count(*) AS n FROM events WHERE discrepancyId = ? AND type = 'discrepancy.assigned'`,
      [id],
    );
    expect(events[0]?.n).toBe(1);
  });

  it('an assignment and a move at once: one wins; the loser changes nothing', async () => {
    const { id } = await answeredDiscrepancy('assign-move-race');
    const [assigned, accepted] = await Promise.all([
      request(base)
        .patch(`/api/discrepancies/${id}/assignment`)
        .set(bearer(tok.checker))
        .send({ dueDate: '2026-12-24' }),
      move('checker', id, { to: 'accepted' }),
    ]);
    expect([assigned.status, accepted.status].sort()).toEqual([200, 409]);
    const detail = await request(base).get(`/api/discrepancies/${id}`).set(bearer(tok.checker));
    expect(detail.body.status).toBe(accepted.status === 200 ? 'accepted' : 'answered');
    expect(detail.body.dueDate).toBe(assigned.status === 200 ? '2026-12-24' : null);
  });

  it('a revision and a move on the item it fixes at once: the item ends resolved, the move is made or refused whole', async () => {
    const res = await upload('rev-race');
    const submittalId = res.body.submittalId as number;
    const list = await request(base)
      .get(`/api/projects/1/discrepancies?submittalId=${submittalId}`)
      .set(bearer(tok.checker));
    const id = (list.body.items as { id: number }[])[0]?.id as number;
    const [revision, answered] = await Promise.all([
      request(base)
        .post('/api/projects/1/submittals')
        .set(bearer(tok.consultant))
        .field('title', 'Parallel rev-race fixed')
        .field('revisionOf', String(submittalId))
        .attach('files', calcFile('SP-rev-race'), 'rev-race.json'),
      move('consultant', id, { to: 'answered', note: 'Fixed in the next issue.' }),
    ]);
    expect(revision.status).toBe(201);
    expect([200, 409]).toContain(answered.status);
    const rows = await sql<{ status: string; supersededBySubmittalId: number }>(
      'SELECT status, supersededBySubmittalId FROM discrepancies WHERE id = ?',
      [id],
    );
    expect(rows[0]).toEqual({ status: 'resolved', supersededBySubmittalId: revision.body.submittalId });
    const types = await sql<{ type: string }>('SELECT type FROM events WHERE discrepancyId = ? ORDER BY id', [
      id,
    ]);
    expect(types.map((e) => e.type)).toEqual(
      answered.status === 200 ? ['discrepancy.answered', 'discrepancy.resolved'] : ['discrepancy.resolved'],
    );
  });
});

describe('two checkers stamping one submittal at once', () => {
  it('exactly one stamp is applied and mailed; the other gets 409 with the stamp that won', async () => {
    const res = await upload('stamp-race');
    const id = res.body.submittalId as number;
    const stamp = (action: string) =>
      request(base)
        .post(`/api/submittals/${id}/stamp`)
        .set(bearer(tok.checker))
        .send({ action, comment: 'Reviewed.', overrideReason: 'Race test.' });
    const [a, b] = await Promise.all([stamp('rejected'), stamp('revise-and-resubmit')]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    const winner = a.status === 200 ? a : b;
    const loser = a.status === 200 ? b : a;
    expect(loser.body.details).toEqual([
      expect.objectContaining({ id, status: 'stamped', action: winner.body.stamp.action }),
    ]);
    const events = await sql<{ n: number }>(
      `SELECT count(*) AS n FROM events WHERE submittalId = ? AND type = 'submittal.stamped'`,
      [id],
    );
    expect(events[0]?.n).toBe(1);
    const mails = await sql<{ subject: string }>(
      `SELECT DISTINCT subject FROM mail_outbox WHERE kind = 'submittal-stamped' AND subject LIKE ?`,
      ['%Parallel stamp-race%'],
    );
    expect(mails).toHaveLength(1);
  });
});

describe('many writes at once', () => {
  it('20 uploads at once all succeed, with their own files, and health answers meanwhile', async () => {
    const tags = Array.from({ length: 20 }, (_, i) => `bulk-${i}`);
    const [health, ...replies] = await Promise.all([
      request(base).get('/api/health'),
      ...tags.map((tag) => upload(tag)),
    ]);
    expect(replies.map((r) => r.status)).toEqual(tags.map(() => 201));
    expect(health?.status).toBe(200);
    const ids = replies.map((r) => r.body.submittalId as number);
    expect(new Set(ids).size).toBe(20);
    const files = await sql<{ submittalId: number; fileName: string }>(
      `SELECT submittalId, fileName FROM calc_files WHERE submittalId IN (${ids.map(() => '?').join(',')})`,
      ids,
    );
    expect(files.map((f) => `${f.submittalId}:${f.fileName}`).sort()).toEqual(
      ids.map((id, i) => `${id}:${tags[i]}.json`).sort(),
    );
  });

  it('moves of 20 discrepancies at once all succeed, each recorded once', async () => {
    const res = await request(base)
      .post('/api/projects/1/submittals')
      .set(bearer(tok.consultant))
      .field('title', 'Parallel moves')
      .attach(
        'files',
        Buffer.from(
          JSON.stringify({
            ...JSON.parse(calcFile('MV-0', { claims: { An: 6.0 } }).toString()),
            members: Array.from(
              { length: 20 },
              (_, i) => JSON.parse(calcFile(`MV-${i}`, { claims: { An: 6.0 } }).toString()).members[0],
            ),
          }),
        ),
        'moves.json',
      );
    expect(res.status).toBe(201);
    const list = await request(base)
      .get(`/api/projects/1/discrepancies?submittalId=${res.body.submittalId}&pageSize=100`)
      .set(bearer(tok.checker));
    const ids = (list.body.items as { id: number }[]).map((d) => d.id);
    expect(ids.length).toBeGreaterThanOrEqual(20);
    const replies = await Promise.all(
      ids.map((id) => move('consultant', id, { to: 'answered', note: 'All at once.' })),
    );
    expect(replies.map((r) => r.status)).toEqual(ids.map(() => 200));
    const events = await sql<{ n: number }>(
      `SELECT count(*) AS n FROM events WHERE type = 'discrepancy.answered' AND submittalId = ?`,
      [res.body.submittalId as number],
    );
    expect(events[0]?.n).toBe(ids.length);
  });

  it('flushing the outbox twice at once sends every message once', async () => {
    const flush = () => request(base).post('/api/mail/outbox/flush').set(bearer(tok.admin));
    // The outbox holds more than one flush takes (50), so the two runs overlap on real rows.
    while ((await sql<{ n: number }>(`SELECT count(*) AS n FROM mail_outbox WHERE status = 'pending'`))[0]?.n)
      await Promise.all([flush(), flush()]);
    const sent = await sql<{ n: number }>(`SELECT count(*) AS n FROM mail_outbox WHERE status = 'sent'`);
    const received = await sql<{ n: number }>(`SELECT count(*) AS n FROM mailbox_messages`);
    expect(received[0]?.n).toBe(sent[0]?.n);
  });
});
