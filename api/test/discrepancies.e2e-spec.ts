import { Sequelize } from 'sequelize-typescript';
import request from 'supertest';
import { bearer, bootApp, calcFile, EMAIL, login, type TestApp } from './helpers.js';

let t: TestApp;
const tok = { admin: '', consultant: '', checker: '', owner: '' };

/** Uploads one file whose claimed An (6.0 in²) overstates the recomputed 5.125 in²: LG101, error. */
async function freshDiscrepancies(
  tag: string,
  extra: Record<string, unknown> = {},
): Promise<{ submittalId: number; ids: number[] }> {
  const res = await request(t.http)
    .post('/api/projects/1/submittals')
    .set(bearer(tok.consultant))
    .field('title', `Flow ${tag}`)
    .attach('files', calcFile(`SP-${tag}`, { claims: { An: 6.0 }, ...extra }), `${tag}.json`);
  expect(res.status).toBe(201);
  const list = await request(t.http)
    .get(`/api/projects/1/discrepancies?submittalId=${res.body.submittalId}`)
    .set(bearer(tok.checker));
  return { submittalId: res.body.submittalId, ids: (list.body.items as { id: number }[]).map((d) => d.id) };
}

function move(who: keyof typeof tok, id: number, body: object) {
  return request(t.http).post(`/api/discrepancies/${id}/transitions`).set(bearer(tok[who])).send(body);
}

beforeAll(async () => {
  t = await bootApp();
  tok.admin = await login(t.http, EMAIL.admin);
  tok.consultant = await login(t.http, EMAIL.consultant);
  tok.checker = await login(t.http, EMAIL.checker);
  tok.owner = await login(t.http, EMAIL.owner);
});
afterAll(async () => t.close());

describe('status moves that are allowed', () => {
  it('raised → answered (consultant, note) → accepted (checker), each move an event', async () => {
    const { ids } = await freshDiscrepancies('A1');
    const id = ids[0] as number;
    const answered = await move('consultant', id, { to: 'answered', note: 'Zigzag now checked.' });
    expect(answered.status).toBe(200);
    expect(answered.body.status).toBe('answered');
    const accepted = await move('checker', id, { to: 'accepted' });
    expect(accepted.body.status).toBe('accepted');
    expect(
      (accepted.body.history as { type: string; data: { from: string; to: string } }[]).map((e) => [
        e.type,
        e.data.from,
        e.data.to,
      ]),
    ).toEqual([
      ['discrepancy.answered', 'raised', 'answered'],
      ['discrepancy.accepted', 'answered', 'accepted'],
    ]);
  });

  it('answered → returned (checker, reason) → answered again → accepted', async () => {
    const id = (await freshDiscrepancies('A2')).ids[0] as number;
    await move('consultant', id, { to: 'answered', note: 'first answer' });
    expect((await move('checker', id, { to: 'returned', note: 'Show the chain.' })).body.status).toBe(
      'returned',
    );
    expect((await move('consultant', id, { to: 'answered', note: 'second answer' })).body.status).toBe(
      'answered',
    );
    expect((await move('checker', id, { to: 'accepted' })).body.status).toBe('accepted');
  });

  it('the checker may waive from raised, answered and returned, with a reason', async () => {
    const a = (await freshDiscrepancies('W1')).ids[0] as number;
    expect((await move('checker', a, { to: 'waived', note: 'Covered by test load.' })).body.status).toBe(
      'waived',
    );
    const b = (await freshDiscrepancies('W2')).ids[0] as number;
    await move('consultant', b, { to: 'answered', note: 'n' });
    expect((await move('checker', b, { to: 'waived', note: 'r' })).body.status).toBe('waived');
    const c = (await freshDiscrepancies('W3')).ids[0] as number;
    await move('consultant', c, { to: 'answered', note: 'n' });
    await move('checker', c, { to: 'returned', note: 'r' });
    expect((await move('checker', c, { to: 'waived', note: 'r' })).body.status).toBe('waived');
  });

  it('an answer may link a revision instead of a note, while the item is current', async () => {
    const { submittalId, ids } = await freshDiscrepancies('R1');
    // A revision holding other files only: it does not re-check R1.json, so the item stays current.
    const revision = await request(t.http)
      .post('/api/projects/1/submittals')
      .set(bearer(tok.consultant))
      .field('title', 'Fix R1')
      .field('revisionOf', String(submittalId))
      .attach('files', calcFile('SP-R1-DETAIL'), 'R1-detail.json');
    const res = await move('consultant', ids[0] as number, {
      to: 'answered',
      revisionSubmittalId: revision.body.submittalId,
    });
    expect(res.status).toBe(200);
    expect(res.body.history[0].data.revisionSubmittalId).toBe(revision.body.submittalId);
  });

  it('an answer queues a mail to the project’s checkers', async () => {
    const id = (await freshDiscrepancies('M1')).ids[0] as number;
    await move('consultant', id, { to: 'answered', note: 'see note' });
    const outbox = await request(t.http).get('/api/mail/outbox').set(bearer(tok.admin));
    expect(outbox.body).toEqual(
      expect.arrayContaining([
        expect.objectContaining({
          kind: 'discrepancy-answered',
          to: EMAIL.checker,
          subject: expect.stringContaining('SP-M1'),
        }),
      ]),
    );
  });
});

describe('status moves that are refused', () => {
  let id: number;
  beforeAll(async () => {
    id = (await freshDiscrepancies('X1')).ids[0] as number;
  });

  it.each([
    ['consultant', 'accepted', {}],
    ['consultant', 'returned', { note: 'n' }],
    ['consultant', 'waived', { note: 'n' }],
    ['checker', 'answered', { note: 'n' }],
    ['owner', 'answered', { note: 'n' }],
    ['owner', 'waived', { note: 'n' }],
    ['admin', 'accepted', {}],
  ] as const)('%s may not move to %s (403)', async (who, to, extra) => {
    const res = await move(who, id, { to, ...extra });
    expect(res.status).toBe(403);
    expect((await request(t.http).get(`/api/discrepancies/${id}`).set(bearer(tok.checker))).body.status).toBe(
      'raised',
    );
  });

  it('raised cannot be accepted or returned (409)', async () => {
    expect((await move('checker', id, { to: 'accepted' })).status).toBe(409);
    expect((await move('checker', id, { to: 'returned', note: 'r' })).status).toBe(409);
  });

  it('needs a note or a revision to answer, a reason to return or waive (400)', async () => {
    expect((await move('consultant', id, { to: 'answered' })).status).toBe(400);
    expect((await move('checker', id, { to: 'waived' })).status).toBe(400);
    await move('consultant', id, { to: 'answered', note: 'n' });
    expect((await move('checker', id, { to: 'returned' })).status).toBe(400);
  });

  it('refuses an unknown status and unknown fields (400)', async () => {
    expect((await move('checker', id, { to: 'closed' })).status).toBe(400);
    expect((await move('checker', id, { to: 'accepted', colour: 'red' })).status).toBe(400);
  });

  it('refuses a revision link that does not revise the discrepancy’s submittal (422)', async () => {
    const other = (await freshDiscrepancies('X2')).ids[0] as number;
    const res = await move('consultant', other, { to: 'answered', revisionSubmittalId: 1 });
    expect(res.status).toBe(422);
  });

  it('accepted and waived are final (409)', async () => {
    await move('checker', id, { to: 'accepted' });
    expect((await move('consultant', id, { to: 'answered', note: 'again' })).status).toBe(409);
    expect((await move('checker', id, { to: 'waived', note: 'r' })).status).toBe(409);
    const w = (await freshDiscrepancies('X3')).ids[0] as number;
    await move('checker', w, { to: 'waived', note: 'r' });
    expect((await move('consultant', w, { to: 'answered', note: 'n' })).status).toBe(409);
    expect((await move('checker', w, { to: 'accepted' })).status).toBe(409);
  });

  it('answers 404 for an unknown discrepancy', async () => {
    expect((await move('checker', 999999, { to: 'accepted' })).status).toBe(404);
  });
});

describe('bulk moves, comments, acknowledgement, list', () => {
  it('moves many at once, all or nothing', async () => {
    const a = (await freshDiscrepancies('B1')).ids;
    const b = (await freshDiscrepancies('B2')).ids;
    const ok = await request(t.http)
      .post('/api/projects/1/discrepancies/bulk-transition')
      .set(bearer(tok.checker))
      .send({ ids: [...a, ...b], to: 'waived', note: 'Batch waiver' });
    expect(ok.status).toBe(200);
    expect(ok.body.moved).toBe(a.length + b.length);
    expect((ok.body.items as { status: string }[]).every((d) => d.status === 'waived')).toBe(true);
    const c = (await freshDiscrepancies('B3')).ids;
    const refused = await request(t.http)
      .post('/api/projects/1/discrepancies/bulk-transition')
      .set(bearer(tok.checker))
      .send({ ids: [...c, a[0]], to: 'waived', note: 'again' });
    expect(refused.status).toBe(409);
    expect(refused.body.details).toEqual([expect.objectContaining({ id: a[0], status: 409 })]);
    const still = await request(t.http).get(`/api/discrepancies/${c[0]}`).set(bearer(tok.checker));
    expect(still.body.status).toBe('raised');
  });

  it('keeps comments with the discrepancy and in its history', async () => {
    const id = (await freshDiscrepancies('C1')).ids[0] as number;
    const c = await request(t.http)
      .post(`/api/discrepancies/${id}/comments`)
      .set(bearer(tok.consultant))
      .send({ body: 'Which chain do you mean?' });
    expect(c.status).toBe(201);
    const detail = await request(t.http).get(`/api/discrepancies/${id}`).set(bearer(tok.consultant));
    expect(detail.body.comments).toEqual([
      expect.objectContaining({
        body: 'Which chain do you mean?',
        author: 'Priya Halvorsen',
        authorRole: 'consultant',
      }),
    ]);
    expect(detail.body.history.map((e: { type: string }) => e.type)).toEqual(['discrepancy.commented']);
    expect(detail.body.allowedMoves).toEqual(['answered']);
    const asChecker = await request(t.http).get(`/api/discrepancies/${id}`).set(bearer(tok.checker));
    expect(asChecker.body.allowedMoves).toEqual(['waived']);
  });

  it('lets the owner’s rep acknowledge, once, and nothing else', async () => {
    const id = (await freshDiscrepancies('K1')).ids[0] as number;
    const first = await request(t.http).post(`/api/discrepancies/${id}/acknowledge`).set(bearer(tok.owner));
    expect(first.status).toBe(200);
    expect(first.body.acknowledgedAt).toEqual(expect.any(String));
    expect(first.body.status).toBe('raised');
    const again = await request(t.http).post(`/api/discrepancies/${id}/acknowledge`).set(bearer(tok.owner));
    expect(again.body.acknowledgedAt).toBe(first.body.acknowledgedAt);
    expect(
      again.body.history.filter((e: { type: string }) => e.type === 'discrepancy.acknowledged'),
    ).toHaveLength(1);
    expect(
      (
        await request(t.http)
          .post(`/api/discrepancies/${id}/comments`)
          .set(bearer(tok.owner))
          .send({ body: 'x' })
      ).status,
    ).toBe(403);
  });

  it('filters, sorts and pages on the server', async () => {
    const all = await request(t.http)
      .get('/api/projects/1/discrepancies?pageSize=500')
      .set(bearer(tok.owner));
    const items = all.body.items as { severity: string; class: string; status: string; memberId: string }[];
    expect(all.body.total).toBe(items.length);
    const errors = await request(t.http)
      .get('/api/projects/1/discrepancies?severity=error&pageSize=500')
      .set(bearer(tok.owner));
    expect(errors.body.total).toBe(items.filter((d) => d.severity === 'error').length);
    const twoClasses = await request(t.http)
      .get('/api/projects/1/discrepancies?class=detailing,equal-share&pageSize=500')
      .set(bearer(tok.owner));
    expect(twoClasses.body.total).toBe(
      items.filter((d) => d.class === 'detailing' || d.class === 'equal-share').length,
    );
    expect(twoClasses.body.total).toBeGreaterThan(0);
    const open = await request(t.http)
      .get('/api/projects/1/discrepancies?status=open&pageSize=500')
      .set(bearer(tok.owner));
    expect(open.body.total).toBe(
      items.filter((d) => ['raised', 'answered', 'returned'].includes(d.status)).length,
    );
    const member = await request(t.http)
      .get('/api/projects/1/discrepancies?memberId=H-1&pageSize=500')
      .set(bearer(tok.owner));
    expect(member.body.items.every((d: { memberId: string }) => d.memberId === 'H-1')).toBe(true);
    const sorted = await request(t.http)
      .get('/api/projects/1/discrepancies?sort=severity&order=asc&pageSize=500')
      .set(bearer(tok.owner));
    const ranks = (sorted.body.items as { severity: string }[]).map((d) =>
      ['error', 'warning', 'note'].indexOf(d.severity),
    );
    expect(ranks).toEqual([...ranks].sort((x, y) => x - y));
    const page2 = await request(t.http)
      .get('/api/projects/1/discrepancies?page=2&pageSize=5')
      .set(bearer(tok.owner));
    expect(page2.body).toMatchObject({ page: 2, pageSize: 5, total: all.body.total });
    expect(page2.body.items.map((d: { id: number }) => d.id)).toEqual(
      all.body.items.slice(5, 10).map((d: { id: number }) => d.id),
    );
    expect(
      (await request(t.http).get('/api/projects/1/discrepancies?severity=fatal').set(bearer(tok.owner)))
        .status,
    ).toBe(400);
    // The list's SQL-built items carry exactly the fields of the detail view.
    const first = all.body.items[0] as Record<string, unknown>;
    const detail = await request(t.http)
      .get(`/api/discrepancies/${String(first.id)}`)
      .set(bearer(tok.owner));
    expect(Object.fromEntries(Object.keys(first).map((k) => [k, detail.body[k]]))).toEqual(first);
    const extra = [
      'raisedBy',
      'submittalTitle',
      'history',
      'comments',
      'lineage',
      'carriedInto',
      'resolution',
      'allowedMoves',
      'moves',
      'canAcknowledge',
      'canAssign',
      'canComment',
    ];
    expect(Object.keys(first).sort()).toEqual(
      Object.keys(detail.body)
        .filter((k) => !extra.includes(k))
        .sort(),
    );
  });

  it('gives every filter and sort the same rows, order and total as filtering all rows by hand', async () => {
    type Item = Record<string, string | number | null> & { id: number };
    const all = (
      await request(t.http)
        .get('/api/projects/1/discrepancies?pageSize=500&includeSuperseded=true')
        .set(bearer(tok.owner))
    ).body.items as (Item & { current: boolean })[];
    expect(all.some((d) => !d.current)).toBe(true);
    const text = (d: Item, q: string) =>
      ['message', 'memberId', 'fileName', 'code', 'name', 'pointer'].some((k) =>
        String(d[k] ?? '')
          .toLowerCase()
          .includes(q.toLowerCase()),
      );
    const rank = (s: unknown) => ['error', 'warning', 'note'].indexOf(String(s));
    const value = (d: Item, sort: string) => (sort === 'severity' ? rank(d.severity) : d[sort]);
    const cmp = (x: unknown, y: unknown) =>
      x === y
        ? 0
        : x === null
          ? -1
          : y === null
            ? 1
            : (x as number | string) < (y as number | string)
              ? -1
              : 1;
    const memberId = all.find((d) => d.memberId)?.memberId as string;
    const assigned = all.find((d) => d.assignee !== null)?.assignee as unknown as { id: number };
    const oneCurrent = all.filter((d) => d.current)[2]?.id;
    const filters: [string, (d: Item & { current: boolean }) => boolean][] = [
      ['', (d) => d.current],
      ['includeSuperseded=true', () => true],
      ['includeSuperseded=true&status=resolved', (d) => d.status === 'resolved'],
      [
        'includeSuperseded=false&status=open',
        (d) => d.current && ['raised', 'answered', 'returned'].includes(String(d.status)),
      ],
      ['q=CHAIN', (d) => d.current && text(d, 'chain')],
      ['q=claims%2FAn&includeSuperseded=true', (d) => text(d, 'claims/An')],
      ['q=100%25', (d) => d.current && text(d, '100%')],
      [`q=%23${oneCurrent}`, (d) => d.current && (d.id === oneCurrent || text(d, `#${oneCurrent}`))],
      [
        `assigneeId=${assigned.id}&includeSuperseded=true`,
        (d) => (d.assignee as unknown as { id: number } | null)?.id === assigned.id,
      ],
      ['status=open', (d) => d.current && ['raised', 'answered', 'returned'].includes(String(d.status))],
      [
        'status=accepted,waived&severity=error',
        (d) => d.current && ['accepted', 'waived'].includes(String(d.status)) && d.severity === 'error',
      ],
      [
        'class=overstated,detailing&status=raised',
        (d) => d.current && ['overstated', 'detailing'].includes(String(d.class)) && d.status === 'raised',
      ],
      [
        `submittalId=${all[0]?.submittalId}&severity=warning,note`,
        (d) => d.current && d.submittalId === all[0]?.submittalId && d.severity !== 'error',
      ],
      [
        `memberId=${memberId}&status=open`,
        (d) =>
          d.current &&
          d.memberId === memberId &&
          ['raised', 'answered', 'returned'].includes(String(d.status)),
      ],
      ['code=LG101', (d) => d.current && d.code === 'LG101'],
    ];
    for (const [filter, keep] of filters) {
      // The text, assignee and superseded filters are each seen to match something.
      if (/^(q=|assigneeId|includeSuperseded=true)/.test(filter) && filter !== 'q=100%25')
        expect({ filter, matches: all.filter(keep).length > 0 }).toEqual({ filter, matches: true });
      for (const sort of ['id', 'severity', 'memberId', 'status', 'updatedAt', 'submittalId']) {
        for (const order of ['asc', 'desc'] as const) {
          const expected = all
            .filter(keep)
            .sort((x, y) => (order === 'asc' ? 1 : -1) * cmp(value(x, sort), value(y, sort)) || x.id - y.id);
          const res = await request(t.http)
            .get(`/api/projects/1/discrepancies?${filter}&sort=${sort}&order=${order}&page=2&pageSize=3`)
            .set(bearer(tok.checker));
          expect(res.status).toBe(200);
          expect({ filter, sort, order, total: res.body.total }).toEqual({
            filter,
            sort,
            order,
            total: expected.length,
          });
          expect(res.body.items).toEqual(expected.slice(3, 6));
        }
      }
    }
  });

  it('keeps the event log append-only', async () => {
    await expect(
      t.app.get(Sequelize).query("UPDATE events SET type = 'x' WHERE id = 1"),
    ).rejects.toHaveProperty('parent.message', expect.stringContaining('the event log is append-only'));
    await expect(t.app.get(Sequelize).query('DELETE FROM events')).rejects.toHaveProperty(
      'parent.message',
      expect.stringContaining('the event log is append-only'),
    );
  });
});

describe('stamping', () => {
  it('is blocked while error-severity discrepancies are open, unless overridden with a reason', async () => {
    const { submittalId, ids } = await freshDiscrepancies('S1');
    const blocked = await request(t.http)
      .post(`/api/submittals/${submittalId}/stamp`)
      .set(bearer(tok.checker))
      .send({ action: 'no-exceptions-taken', comment: 'Fine' });
    expect(blocked.status).toBe(409);
    expect(blocked.body.details).toEqual([
      expect.objectContaining({ id: ids[0], code: 'LG101', status: 'raised' }),
    ]);
    const over = await request(t.http)
      .post(`/api/submittals/${submittalId}/stamp`)
      .set(bearer(tok.checker))
      .send({
        action: 'make-corrections-noted',
        comment: 'Correct An per LG101.',
        overrideReason: 'Correction is noted on the stamp.',
      });
    expect(over.status).toBe(200);
    expect(over.body).toMatchObject({
      status: 'stamped',
      stamp: {
        action: 'make-corrections-noted',
        overrideReason: 'Correction is noted on the stamp.',
        stampedBy: 'Tomasz Quell',
      },
    });
    const twice = await request(t.http)
      .post(`/api/submittals/${submittalId}/stamp`)
      .set(bearer(tok.checker))
      .send({ action: 'rejected', comment: 'x' });
    expect(twice.status).toBe(409);
  });

  it('goes through once the errors are resolved, without an override', async () => {
    const { submittalId, ids } = await freshDiscrepancies('S2');
    for (const id of ids)
      await move('checker', id, { to: 'waived', note: 'Accepted by the engineer of record.' });
    const res = await request(t.http)
      .post(`/api/submittals/${submittalId}/stamp`)
      .set(bearer(tok.checker))
      .send({ action: 'no-exceptions-taken', comment: 'No exceptions.' });
    expect(res.status).toBe(200);
    expect(res.body.stamp.overrideReason).toBeNull();
    const outbox = await request(t.http).get('/api/mail/outbox').set(bearer(tok.admin));
    expect(outbox.body).toEqual(
      expect.arrayContaining([
        expect.objectContaining({
          kind: 'submittal-stamped',
          subject: expect.stringContaining('No exceptions taken'),
        }),
      ]),
    );
  });

  it('refuses a review action of someone else’s words (400) and a stamp by anyone but a checker (403)', async () => {
    const { submittalId } = await freshDiscrepancies('S3');
    expect(
      (
        await request(t.http)
          .post(`/api/submittals/${submittalId}/stamp`)
          .set(bearer(tok.checker))
          .send({ action: 'approved', comment: 'x' })
      ).status,
    ).toBe(400);
    expect(
      (
        await request(t.http)
          .post(`/api/submittals/${submittalId}/stamp`)
          .set(bearer(tok.consultant))
          .send({ action: 'rejected', comment: 'x', overrideReason: 'r' })
      ).status,
    ).toBe(403);
  });

  it('prints the review report with members, governing chains, findings, stamp and the caution', async () => {
    const res = await request(t.http).get('/api/submittals/1/report').set(bearer(tok.owner));
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toContain('text/html');
    expect(res.text).toContain('SP-N1');
    expect(res.text).toContain('A1–B1–C1–D1');
    expect(res.text).toContain('LG121');
    expect(res.text).toContain('Revise and resubmit');
    expect(res.text).toContain(
      'Ligament is a checking aid. The engineer of record decides; the governing code and local requirements apply.',
    );
  });
});
