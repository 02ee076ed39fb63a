import { getModelToken } from '@nestjs/sequelize';
import request from 'supertest';
import { MailService } from '../src/mail/mail.service.js';
import { OutboxMessage } from '../src/mail/models/outbox-message.model.js';
import { SmtpFakeService } from '../src/mail/smtp-fake.service.js';
import { bearer, bootApp, calcFile, EMAIL, login, type TestApp } from './helpers.js';

let t: TestApp;
let admin: string;
let consultant: string;

beforeAll(async () => {
  t = await bootApp({ MAIL_RETRY_BASE_MS: '0' });
  admin = await login(t.http, EMAIL.admin);
  consultant = await login(t.http, EMAIL.consultant);
});
afterAll(async () => t.close());

const outbox = async () =>
  (await request(t.http).get('/api/mail/outbox').set(bearer(admin))).body as {
    kind: string;
    to: string;
    status: string;
    attempts: number;
    lastError: string | null;
  }[];
const mailbox = async () =>
  (await request(t.http).get('/api/mail/mailbox').set(bearer(admin))).body as {
    to: string;
    subject: string;
    text: string;
  }[];

describe('outbox with retry', () => {
  it('delivers the seed’s queued mail to the SMTP fake', async () => {
    const mail = t.app.get(MailService);
    const result = await mail.flush();
    expect(result.failed).toBe(0);
    expect(result.sent).toBeGreaterThan(0);
    expect((await outbox()).every((m) => m.status === 'sent')).toBe(true);
    expect((await mailbox()).map((m) => m.subject)).toEqual(
      expect.arrayContaining([expect.stringContaining('Submittal checked'), 'You are invited to Ligament']),
    );
  });

  it('health stays ok while a claimed message is on its way, and degrades once a send has failed', async () => {
    const messages = t.app.get<typeof OutboxMessage>(getModelToken(OutboxMessage));
    // As the outbox leaves a message it has claimed: the attempt counted, no error yet.
    const inFlight = await messages.create({
      kind: 'invitation',
      to: 'wren.halloway@larchmont-review.example.test',
      subject: 'On its way',
      text: 'Claimed by the outbox, not yet sent.',
      status: 'pending',
      attempts: 1,
      lastError: null,
      nextAttemptAt: new Date(Date.now() + 60_000),
    });
    expect((await request(t.http).get('/api/health')).body).toMatchObject({
      status: 'ok',
      mail: { ok: true, pending: 1, lastError: null },
    });
    await inFlight.update({ lastError: 'connect ECONNREFUSED 127.0.0.1:2525' });
    expect((await request(t.http).get('/api/health')).body).toMatchObject({
      status: 'degraded',
      mail: { ok: false, lastError: 'connect ECONNREFUSED 127.0.0.1:2525' },
    });
    await inFlight.destroy();
  });

  it('an SMTP outage never fails the request; the mail waits and goes out when SMTP is back', async () => {
    const fake = t.app.get(SmtpFakeService);
    const mail = t.app.get(MailService);
    await fake.stop();
    const upload = await request(t.http)
      .post('/api/projects/1/submittals')
      .set(bearer(consultant))
      .field('title', 'Sent during the outage')
      .attach('files', calcFile('SP-OUT'), 'outage.json');
    expect(upload.status).toBe(201);
    const down = await mail.flush();
    expect(down.sent).toBe(0);
    expect(down.failed).toBeGreaterThan(0);
    const waiting = (await outbox()).filter((m) => m.status === 'pending');
    expect(waiting.length).toBe(down.failed);
    expect(waiting.every((m) => m.attempts === 1 && (m.lastError ?? '').length > 0)).toBe(true);
    const health = await request(t.http).get('/api/health');
    expect(health.body).toMatchObject({
      status: 'degraded',
      database: { ok: true },
      mail: { ok: false, fakeRunning: false, pending: waiting.length },
    });

    await mail.flush();
    expect((await outbox()).filter((m) => m.status === 'pending').every((m) => m.attempts === 2)).toBe(true);

    await fake.start();
    const up = await mail.flush();
    expect(up).toEqual({ sent: waiting.length, failed: 0 });
    expect((await outbox()).every((m) => m.status === 'sent')).toBe(true);
    const subjects = (await mailbox()).map((m) => m.subject);
    expect(subjects.filter((s) => s.includes('Sent during the outage'))).toHaveLength(waiting.length);
    expect((await request(t.http).get('/api/health')).body).toMatchObject({
      status: 'ok',
      mail: { ok: true, pending: 0 },
    });
  });
});

describe('invitations', () => {
  it('mails a one-time link; the invitee sets a password with it and can sign in', async () => {
    const created = await request(t.http).post('/api/invitations').set(bearer(admin)).send({
      email: 'Wren.Halloway@Larchmont-Review.example.test',
      name: 'Wren Halloway',
      role: 'checker',
      organisationId: 3,
    });
    expect(created.status).toBe(201);
    expect(created.body).not.toHaveProperty('token');
    await t.app.get(MailService).flush();
    const message = (await mailbox()).find((m) =>
      m.to.includes('wren.halloway@larchmont-review.example.test'),
    );
    const link = /http:\/\/ligament\.test\/invitations\/(inv_[A-Za-z0-9_-]+)/.exec(message?.text ?? '');
    expect(link).not.toBeNull();
    const token = link?.[1] as string;
    const preview = await request(t.http).get(`/api/invitations/${token}`);
    expect(preview.body).toMatchObject({
      email: 'wren.halloway@larchmont-review.example.test',
      role: 'checker',
      organisation: 'Larchmont Peer Review',
    });
    expect(
      (await request(t.http).post(`/api/invitations/${token}/accept`).send({ password: 'short' })).status,
    ).toBe(400);
    expect(
      (
        await request(t.http)
          .post(`/api/invitations/${token}/accept`)
          .send({ password: 'a-long-enough-password' })
      ).status,
    ).toBe(201);
    expect(
      (
        await request(t.http)
          .post(`/api/invitations/${token}/accept`)
          .send({ password: 'a-long-enough-password' })
      ).status,
    ).toBe(410);
    const signedIn = await login(
      t.http,
      'wren.halloway@larchmont-review.example.test',
      'a-long-enough-password',
    );
    const me = await request(t.http).get('/api/auth/me').set(bearer(signedIn));
    expect(me.body).toMatchObject({ name: 'Wren Halloway', role: 'checker', via: 'password' });
  });

  it('refuses an invitation for an address that already has an account (409)', async () => {
    const res = await request(t.http)
      .post('/api/invitations')
      .set(bearer(admin))
      .send({ email: EMAIL.checker, name: 'Again', role: 'checker' });
    expect(res.status).toBe(409);
  });
});
