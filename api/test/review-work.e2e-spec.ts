import request from 'supertest';
import { bearer, bootApp, calcFile, EMAIL, login, type TestApp } from './helpers.js';

/** Reopening, assignee and due date, and who is told what (in the app and by mail, once each). */
let t: TestApp;
const tok = { admin: '', consultant: '', checker: '', owner: '' };
const ids = { consultant: 0, checker: 0, owner: 0 };

async function fresh(tag: string, claims: Record<string, unknown> = { An: 6.0 }): Promise<number> {
  const res = await request(t.http)
    .post('/api/projects/1/submittals')
    .set(bearer(tok.consultant))
    .field('title', `Work ${tag}`)
    .attach('files', calcFile(`WK-${tag}`, { claims }), `${tag}.json`);
  expect(res.status).toBe(201);
  const list = await request(t.http)
    .get(`/api/projects/1/discrepancies?submittalId=${res.body.submittalId}`)
    .set(bearer(tok.checker));
  return (list.body.items as { id: number }[])[0]?.id as number;
}

function move(who: keyof typeof tok, id: number, body: object) {
  return request(t.http).post(`/api/discrepancies/${id}/transitions`).set(bearer(tok[who])).send(body);
}

function assign(who: keyof typeof tok, id: number, body: object) {
  return request(t.http).patch(`/api/discrepancies/${id}/assignment`).set(bearer(tok[who])).send(body);
}

async function unread(who: keyof typeof tok): Promise<number> {
  return (await request(t.http).get('/api/notifications/unread-count').set(bearer(tok[who]))).body
    .unread as number;
}

async function outbox(): Promise<{ kind: string; to: string; subject: string }[]> {
  return (await request(t.http).get('/api/mail/outbox').set(bearer(tok.admin))).body;
}

beforeAll(async () => {
  t = await bootApp();
  tok.admin = await login(t.http, EMAIL.admin);
  tok.consultant = await login(t.http, EMAIL.consultant);
  tok.checker = await login(t.http, EMAIL.checker);
  tok.owner = await login(t.http, EMAIL.owner);
  for (const who of ['consultant', 'checker', 'owner'] as const)
    ids[who] = (await request(t.http).get('/api/auth/me').set(bearer(tok[who]))).body.id;
});
afterAll(async () => t.close());

describe('reopening', () => {
  it('sends an accepted item back to the consultant as returned, with the checker’s note', async () => {
    const id = await fresh('RO1');
    await move('consultant', id, { to: 'answered', note: 'Checked.' }).expect(200);
    await move('checker', id, { to: 'accepted' }).expect(200);
    const accepted = await request(t.http).get(`/api/discrepancies/${id}`).set(bearer(tok.checker));
    expect(accepted.body.moves).toEqual([{ action: 'reopen', to: 'returned', requires: 'reason' }]);
    const res = await move('checker', id, { to: 'returned', note: 'The splice plate changed; check again.' });
    expect(res.status).toBe(200);
    expect(res.body.status).toBe('returned');
    expect(res.body.history.at(-1)).toMatchObject({
      type: 'discrepancy.reopened',
      data: { from: 'accepted', to: 'returned', note: 'The splice plate changed; check again.' },
    });
    // Back in the consultant's hands, answered as any returned item.
    await move('consultant', id, { to: 'answered', note: 'Rechecked.' }).expect(200);
  });

  it('reopens a waived item too; needs a note; only a checker; never in a bulk move', async () => {
    const id = await fresh('RO2');
    await move('checker', id, { to: 'waived', note: 'Agreed on site.' }).expect(200);
    expect((await move('checker', id, { to: 'returned' })).body.message).toMatch(/Reopening needs a reason/);
    expect((await move('consultant', id, { to: 'returned', note: 'x' })).status).toBe(403);
    const bulk = await request(t.http)
      .post('/api/projects/1/discrepancies/bulk-transition')
      .set(bearer(tok.checker))
      .send({ ids: [id], to: 'returned', note: 'again' });
    expect(bulk.status).toBe(409);
    expect(bulk.body.details[0].message).toMatch(/one at a time/);
    expect((await move('checker', id, { to: 'returned', note: 'Not agreed after all.' })).body.status).toBe(
      'returned',
    );
  });
});

describe('a change made on what someone saw', () => {
  it('is refused with the state that won when the item changed since it was read', async () => {
    const id = await fresh('VS1');
    const seen = (await request(t.http).get(`/api/discrepancies/${id}`).set(bearer(tok.checker))).body;
    expect(seen.version).toBe(0);
    await move('consultant', id, { to: 'answered', note: 'Meanwhile.', version: 0 }).expect(200);
    const stale = await move('checker', id, { to: 'waived', note: 'Old view.', version: seen.version });
    expect(stale.status).toBe(409);
    expect(stale.body.message).toBe(
      `Someone else changed discrepancy #${id} first: it is now Answered. Your move to Waived was not made.`,
    );
    expect(stale.body.details).toEqual([expect.objectContaining({ id, status: 'answered', version: 1 })]);
    const assign = await request(t.http)
      .patch(`/api/discrepancies/${id}/assignment`)
      .set(bearer(tok.checker))
      .send({ dueDate: '2026-12-18', version: 0 });
    expect(assign.status).toBe(409);
    expect((await move('checker', id, { to: 'accepted', version: 1 })).status).toBe(200);
  });

  it('a move the status does not allow says so, with the status it has', async () => {
    const id = await fresh('VS2');
    await move('checker', id, { to: 'waived', note: 'Done.' }).expect(200);
    const again = await move('checker', id, { to: 'waived', note: 'Again.' });
    expect(again.status).toBe(409);
    expect(again.body.details).toEqual([expect.objectContaining({ id, status: 'waived' })]);
  });
});

describe('assignee and due date', () => {
  it('the checker sets, changes and clears them; each change is an event', async () => {
    const id = await fresh('AS1');
    const set = await assign('checker', id, { assigneeId: ids.consultant, dueDate: '2026-12-18' });
    expect(set.status).toBe(200);
    expect(set.body).toMatchObject({
      assignee: { id: ids.consultant, name: 'Priya Halvorsen' },
      dueDate: '2026-12-18',
      canAssign: true,
    });
    const due = await assign('checker', id, { dueDate: '2027-01-08' });
    expect(due.body).toMatchObject({ assignee: { id: ids.consultant }, dueDate: '2027-01-08' });
    const cleared = await assign('checker', id, { assigneeId: null, dueDate: null });
    expect(cleared.body).toMatchObject({ assignee: null, dueDate: null });
    expect(
      (cleared.body.history as { type: string }[]).filter((e) => e.type === 'discrepancy.assigned').length,
    ).toBe(3);
    const list = await request(t.http)
      .get(`/api/projects/1/discrepancies?assigneeId=${ids.consultant}&pageSize=500`)
      .set(bearer(tok.checker));
    expect((list.body.items as { id: number }[]).some((d) => d.id === id)).toBe(false);
  });

  it('refuses someone who cannot work on it (422), a day that is not a day (400), other roles (403)', async () => {
    const id = await fresh('AS2');
    const owner = await assign('checker', id, { assigneeId: ids.owner });
    expect(owner.status).toBe(422);
    expect(owner.body.details).toEqual([
      expect.objectContaining({ field: 'assigneeId', rule: 'project-worker' }),
    ]);
    expect((await assign('checker', id, { assigneeId: 999999 })).status).toBe(422);
    expect((await assign('checker', id, { dueDate: '2026-02-30' })).status).toBe(400);
    expect((await assign('checker', id, { dueDate: '18/12/2026' })).status).toBe(400);
    expect((await assign('consultant', id, { dueDate: '2026-12-18' })).status).toBe(403);
  });
});

describe('notifications', () => {
  it('tell the consultant when an item is returned, accepted or waived, and the checker when answered', async () => {
    const id = await fresh('NT1');
    const consultantBefore = await unread('consultant');
    const checkerBefore = await unread('checker');
    await move('consultant', id, { to: 'answered', note: 'See the chain.' }).expect(200);
    expect(await unread('checker')).toBe(checkerBefore + 1);
    await move('checker', id, { to: 'returned', note: 'Show the chain in the calc.' }).expect(200);
    await move('consultant', id, { to: 'answered', note: 'Shown.' }).expect(200);
    await move('checker', id, { to: 'accepted', note: 'Fine.' }).expect(200);
    expect(await unread('consultant')).toBe(consultantBefore + 2);
    const list = await request(t.http).get('/api/notifications?pageSize=2').set(bearer(tok.consultant));
    expect(list.body.items.map((n: { kind: string }) => n.kind)).toEqual(['accepted', 'returned']);
    expect(list.body.items[1]).toMatchObject({
      title: 'Tomasz Quell returned LG101 on WK-NT1',
      body: expect.stringContaining('Reason: “Show the chain in the calc.”'),
      webPath: `/discrepancies/${id}`,
      discrepancyId: id,
      actor: { name: 'Tomasz Quell', role: 'checker' },
      readAt: null,
    });
    // Nobody is told about their own move; the owner's rep is not told at all.
    const owner = await request(t.http).get('/api/notifications').set(bearer(tok.owner));
    expect(owner.body.items.filter((n: { discrepancyId: number }) => n.discrepancyId === id)).toEqual([]);
  });

  it('send one mail per event and recipient through the outbox, in words, with a link', async () => {
    const id = await fresh('NT2');
    await move('checker', id, { to: 'waived', note: 'Agreed with the fabricator.' }).expect(200);
    const mails = (await outbox()).filter((m) => m.subject.includes('WK-NT2'));
    expect(mails).toEqual([
      expect.objectContaining({
        kind: 'discrepancy-waived',
        to: EMAIL.consultant,
        subject: 'Tomasz Quell waived LG101 on WK-NT2 · Harbour Lantern Footbridge',
      }),
    ]);
    // A flush sends up to 50 due messages; the demo's and this file's mail are ahead of this one.
    while ((await outbox()).some((m) => (m as { status?: string }).status === 'pending'))
      await request(t.http).post('/api/mail/outbox/flush').set(bearer(tok.admin)).expect(201);
    const box = await request(t.http).get('/api/mail/mailbox').set(bearer(tok.admin));
    const mail = (box.body as { subject: string; text: string }[]).find((m) => m.subject.includes('WK-NT2'));
    expect(mail?.text).toContain(`http://ligament.test/discrepancies/${id}`);
    expect(mail?.text).toContain('Reason: “Agreed with the fabricator.”');
    expect(mail?.text).toContain('It is now Waived.');
    expect(mail?.text).not.toMatch(/\b(HTTP|409|403|Conflict|Forbidden)\b/);
  });

  it('tell a new assignee, and tell nobody twice for one bulk move', async () => {
    const a = await fresh('NT3');
    const b = await fresh('NT4');
    await assign('checker', a, { assigneeId: ids.consultant, dueDate: '2026-12-18' }).expect(200);
    const assigned = await request(t.http).get('/api/notifications?pageSize=1').set(bearer(tok.consultant));
    expect(assigned.body.items[0]).toMatchObject({
      kind: 'assigned',
      title: 'Tomasz Quell assigned LG101 on WK-NT3 to you',
      body: expect.stringContaining('Due: 2026-12-18.'),
    });
    const before = await unread('consultant');
    await request(t.http)
      .post('/api/projects/1/discrepancies/bulk-transition')
      .set(bearer(tok.checker))
      .send({ ids: [a, b], to: 'waived', note: 'Both agreed.' })
      .expect(200);
    expect(await unread('consultant')).toBe(before + 1);
    const bulk = await request(t.http).get('/api/notifications?pageSize=1').set(bearer(tok.consultant));
    expect(bulk.body.items[0]).toMatchObject({
      kind: 'waived',
      title: 'Tomasz Quell waived 2 discrepancies',
      body: expect.stringContaining(`#${a} LG101 on WK-NT3`),
    });
  });

  it('can be marked read one by one or all at once, only by their owner', async () => {
    const list = await request(t.http).get('/api/notifications?unread=true').set(bearer(tok.consultant));
    const first = list.body.items[0] as { id: number };
    const read = await request(t.http)
      .post(`/api/notifications/${first.id}/read`)
      .set(bearer(tok.consultant));
    expect(read.status).toBe(200);
    expect(read.body.readAt).toEqual(expect.any(String));
    const again = await request(t.http)
      .post(`/api/notifications/${first.id}/read`)
      .set(bearer(tok.consultant));
    expect(again.body.readAt).toBe(read.body.readAt);
    expect(
      (await request(t.http).post(`/api/notifications/${first.id}/read`).set(bearer(tok.checker))).status,
    ).toBe(404);
    const all = await request(t.http).post('/api/notifications/read-all').set(bearer(tok.consultant));
    expect(all.body.marked).toBe(list.body.unread - 1);
    expect(await unread('consultant')).toBe(0);
  });

  it('are off per kind as each user chooses: in the app and by mail apart', async () => {
    const settings = await request(t.http).get('/api/notifications/settings').set(bearer(tok.consultant));
    expect(settings.body.map((s: { kind: string }) => s.kind)).toEqual([
      'returned',
      'accepted',
      'waived',
      'reopened',
      'assigned',
    ]);
    const put = await request(t.http)
      .put('/api/notifications/settings')
      .set(bearer(tok.consultant))
      .send({
        settings: [
          { kind: 'waived', inApp: false, mail: false },
          { kind: 'returned', inApp: true, mail: false },
        ],
      });
    expect(put.status).toBe(200);
    expect(put.body.find((s: { kind: string }) => s.kind === 'waived')).toMatchObject({
      inApp: false,
      mail: false,
    });
    const id = await fresh('NT5');
    await move('checker', id, { to: 'waived', note: 'Quietly.' }).expect(200);
    const other = await fresh('NT6');
    await move('consultant', other, { to: 'answered', note: 'n' }).expect(200);
    await move('checker', other, { to: 'returned', note: 'Again.' }).expect(200);
    expect(await unread('consultant')).toBe(1);
    const mails = (await outbox()).filter(
      (m) => /WK-NT5|WK-NT6/.test(m.subject) && m.to === EMAIL.consultant,
    );
    expect(mails).toEqual([]);
    const bad = await request(t.http)
      .put('/api/notifications/settings')
      .set(bearer(tok.consultant))
      .send({ settings: [{ kind: 'everything', inApp: true, mail: true }] });
    expect(bad.status).toBe(400);
  });
});
