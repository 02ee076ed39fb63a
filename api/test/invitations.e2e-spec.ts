/**
 * Invitations an admin revokes or sends again: the old link dies, the page behind a dead link says
 * why, every change is an audit event, and accepting races revoking with exactly one winner.
 */
import type { AddressInfo } from 'node:net';
import { Sequelize } from 'sequelize-typescript';
import request from 'supertest';
import { bearer, bootApp, EMAIL, login, readDatabase, type TestApp } from './helpers.js';

let t: TestApp;
let base = '';
let admin = '';

beforeAll(async () => {
  t = await bootApp();
  await t.app.listen(0, '127.0.0.1');
  base = `http://127.0.0.1:${(t.http.address() as AddressInfo).port}`;
  admin = await login(t.http, EMAIL.admin);
});
afterAll(async () => t.close());

const sql = <T>(query: string, params: (string | number)[] = []) => readDatabase<T>(t, query, params);

interface Mail {
  subject: string;
  text: string;
}

/** The invitation mails queued for an address, oldest first, with the link token of each. */
async function mailsTo(email: string): Promise<(Mail & { token: string })[]> {
  const rows = await sql<Mail>('SELECT subject, text FROM mail_outbox WHERE "to" = ? ORDER BY id', [email]);
  return rows.map((r) => ({ ...r, token: /\/invitations\/(inv_[A-Za-z0-9_-]+)/.exec(r.text)?.[1] ?? '' }));
}

async function invite(email: string, role = 'owner-rep'): Promise<{ id: number; token: string }> {
  const res = await request(base)
    .post('/api/invitations')
    .set(bearer(admin))
    .send({ email, name: 'Wen Okafor', role });
  expect(res.status).toBe(201);
  const mails = await mailsTo(email);
  return { id: res.body.id as number, token: mails[mails.length - 1]!.token };
}

const preview = (token: string) => request(base).get(`/api/invitations/${token}`);
const resend = (id: number) => request(base).post(`/api/invitations/${id}/resend`).set(bearer(admin));
const revoke = (id: number) => request(base).post(`/api/invitations/${id}/revoke`).set(bearer(admin));
const accept = (token: string) =>
  request(base).post(`/api/invitations/${token}/accept`).send({ password: 'heron-gusset-plate-55' });

describe('sending an invitation again', () => {
  it('makes a new link, kills the old one, says so in the mail and records the event', async () => {
    const email = 'wen.okafor@tidewater-crossing.example.test';
    const first = await invite(email);
    const res = await resend(first.id);
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ email, role: 'owner-rep', state: 'waiting', replacedById: null });
    expect(res.body.id).not.toBe(first.id);

    const mails = await mailsTo(email);
    expect(mails).toHaveLength(2);
    expect(mails[0]?.text).toContain('has invited you to Ligament as owner’s representative.');
    expect(mails[1]?.subject).toBe('Your Ligament invitation, with a new link');
    expect(mails[1]?.text).toContain('This is a new link: the one sent before no longer works.');
    expect(mails[1]?.token).not.toBe(first.token);

    const old = await preview(first.token);
    expect(old.status).toBe(410);
    expect(old.body).toEqual({
      statusCode: 410,
      error: 'Gone',
      message: 'This invitation was sent again with a new link; use the link in the latest e-mail.',
      details: [{ state: 'replaced' }],
    });
    expect((await accept(first.token)).status).toBe(410);
    expect((await preview(mails[1]!.token)).status).toBe(200);

    const list = (await request(base).get('/api/invitations').set(bearer(admin))).body as {
      id: number;
      state: string;
      replacedById: number | null;
    }[];
    expect(list.find((i) => i.id === first.id)).toMatchObject({
      state: 'replaced',
      replacedById: res.body.id,
    });
    // A replaced invitation is not sent again or revoked: the new one is.
    const again = await resend(first.id);
    expect(again.status).toBe(409);
    expect(again.body).toEqual({
      statusCode: 409,
      error: 'Conflict',
      message: `Invitation ${first.id} cannot be resent: it was replaced by invitation ${res.body.id}.`,
      details: [{ id: first.id, state: 'replaced' }],
    });

    const [event] = await sql<{ actorId: number; data: string }>(
      "SELECT actorId, data FROM events WHERE type = 'invitation.resent'",
    );
    expect(event?.actorId).toBe(1);
    expect(JSON.parse(event?.data ?? '{}')).toEqual({
      invitationId: first.id,
      replacedById: res.body.id,
      email,
    });
  });

  it('works for an expired invitation too', async () => {
    const email = 'lapsed.invitee@fennick-ode.example.test';
    const { id } = await invite(email, 'consultant');
    const past = new Date(Date.now() - 3600_000).toISOString().replace('T', ' ').replace('Z', ' +00:00');
    await t.app
      .get(Sequelize)
      .query('UPDATE invitations SET expiresAt = ? WHERE id = ?', { replacements: [past, id] });
    const listed = (await request(base).get('/api/invitations').set(bearer(admin))).body as {
      id: number;
      state: string;
    }[];
    expect(listed.find((i) => i.id === id)?.state).toBe('expired');
    const res = await resend(id);
    expect(res.status).toBe(201);
    expect(res.body.state).toBe('waiting');
  });
});

describe('revoking an invitation', () => {
  it('kills its link with a page-ready message, and records who did it', async () => {
    const email = 'ines.marr@larchmont-review.example.test';
    const { id, token } = await invite(email, 'checker');
    const res = await revoke(id);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ id, state: 'revoked', revokedAt: expect.any(String) });
    const dead = await preview(token);
    expect(dead.status).toBe(410);
    expect(dead.body).toEqual({
      statusCode: 410,
      error: 'Gone',
      message: 'This invitation was withdrawn by an admin; ask them if you still need an account.',
      details: [{ state: 'revoked' }],
    });
    expect((await accept(token)).status).toBe(410);
    expect(await sql('SELECT id FROM users WHERE email = ?', [email])).toEqual([]);
    expect((await revoke(id)).status).toBe(409);
    expect((await resend(id)).body.message).toBe(
      `Invitation ${id} cannot be resent: it was revoked; invite them again.`,
    );
    const [event] = await sql<{ actorId: number; data: string }>(
      "SELECT actorId, data FROM events WHERE type = 'invitation.revoked'",
    );
    expect(event?.actorId).toBe(1);
    expect(JSON.parse(event?.data ?? '{}')).toEqual({ invitationId: id, email });
    // Invited again by the form, they get a working link.
    const fresh = await invite(email, 'checker');
    expect((await preview(fresh.token)).status).toBe(200);
  });

  it('refuses to revoke or resend an accepted one; its link says to sign in', async () => {
    const email = 'used.link@fennick-ode.example.test';
    const { id, token } = await invite(email, 'consultant');
    expect((await accept(token)).status).toBe(201);
    const used = await preview(token);
    expect(used.status).toBe(410);
    expect(used.body).toMatchObject({
      message: 'This invitation has already been used to set up an account: sign in instead.',
      details: [{ state: 'accepted' }],
    });
    const refused = await revoke(id);
    expect(refused.status).toBe(409);
    expect(refused.body.message).toBe(
      `Invitation ${id} cannot be revoked: it was accepted; deactivate the user instead.`,
    );
    expect((await resend(id)).status).toBe(409);
  });

  it('races accepting: exactly one wins, and a revoked invitation never leaves an account behind', async () => {
    for (let n = 0; n < 4; n++) {
      const email = `racer-${n}@fennick-ode.example.test`;
      const { id, token } = await invite(email, 'consultant');
      const [accepted, revoked] = await Promise.all([accept(token), revoke(id)]);
      const users = await sql('SELECT id FROM users WHERE email = ?', [email]);
      if (accepted.status === 201) {
        expect(revoked.status).toBe(409);
        expect(users).toHaveLength(1);
      } else {
        expect(accepted.status).toBe(410);
        expect(revoked.status).toBe(200);
        expect(users).toHaveLength(0);
      }
    }
  });
});

describe('who may', () => {
  it('lets only an admin revoke or resend', async () => {
    const { id } = await invite('only.admins@fennick-ode.example.test', 'consultant');
    const checker = await login(t.http, EMAIL.checker);
    for (const path of [`/api/invitations/${id}/revoke`, `/api/invitations/${id}/resend`]) {
      expect((await request(base).post(path)).status).toBe(401);
      expect((await request(base).post(path).set(bearer(checker))).status).toBe(403);
    }
    expect((await resend(999_999)).status).toBe(404);
    expect((await revoke(999_999)).body).toEqual({
      statusCode: 404,
      error: 'Not Found',
      message: 'No invitation 999999.',
    });
  });
});
