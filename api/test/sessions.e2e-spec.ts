/**
 * Browser sessions: the refresh cookie, its rotation and reuse detection, the cross-site request
 * forgery defence of the session routes, sign-out and deactivation ending sessions at once, and two
 * tabs refreshing with the same cookie at the same moment (real parallel requests on a port).
 */
import { createHmac } from 'node:crypto';
import type { AddressInfo } from 'node:net';
import request from 'supertest';
import { bearer, bootApp, DEMO_PASSWORD, EMAIL, readDatabase, type TestApp } from './helpers.js';

const SECRET = 'test-secret-0123456789abcdef';
/** LIGAMENT_PUBLIC_URL of the test app: the Origin the web app's pages would send. */
const ORIGIN = 'http://ligament.test';
const SESSION = { 'X-Ligament-Session': '1', Origin: ORIGIN };

let t: TestApp;
let base = '';

beforeAll(async () => {
  t = await bootApp({ JWT_SECRET: SECRET });
  await t.app.listen(0, '127.0.0.1');
  base = `http://127.0.0.1:${(t.http.address() as AddressInfo).port}`;
});
afterAll(async () => t.close());

const sql = <T>(query: string, params: (string | number)[] = []) => readDatabase<T>(t, query, params);

interface Cookie {
  value: string;
  attributes: string[];
}

/** The ligament_session cookie a response sets, or null when it sets none. */
function sessionCookie(res: request.Response): Cookie | null {
  const raw = res.headers['set-cookie'] as unknown as string[] | undefined;
  const line = (raw ?? []).find((c) => c.startsWith('ligament_session='));
  if (!line) return null;
  const [pair = '', ...attributes] = line.split(';').map((s) => s.trim());
  return { value: pair.slice('ligament_session='.length), attributes };
}

async function signIn(email: string): Promise<{ access: string; cookie: string; res: request.Response }> {
  const res = await request(base).post('/api/auth/login').send({ email, password: DEMO_PASSWORD });
  expect(res.status).toBe(200);
  const cookie = sessionCookie(res);
  expect(cookie).not.toBeNull();
  return { access: res.body.accessToken as string, cookie: cookie!.value, res };
}

const refresh = (cookie: string | null, headers: Record<string, string> = SESSION) => {
  const req = request(base).post('/api/auth/session/refresh').set(headers);
  return cookie === null ? req : req.set('Cookie', `ligament_session=${cookie}`);
};
const signOut = (cookie: string) =>
  request(base).post('/api/auth/session/sign-out').set(SESSION).set('Cookie', `ligament_session=${cookie}`);
const me = (access: string) => request(base).get('/api/auth/me').set(bearer(access));

/** The payload of a JWT (no verification: the test reads what the service signed). */
const claims = (jwt: string) =>
  JSON.parse(Buffer.from(jwt.split('.')[1] ?? '', 'base64url').toString('utf8')) as Record<string, unknown>;

function handMadeJwt(payload: Record<string, unknown>): string {
  const part = (o: object) => Buffer.from(JSON.stringify(o)).toString('base64url');
  const head = `${part({ alg: 'HS256', typ: 'JWT' })}.${part(payload)}`;
  return `${head}.${createHmac('sha256', SECRET).update(head).digest('base64url')}`;
}

describe('sign-in', () => {
  it('answers a short-lived access token and sets an httpOnly, SameSite=Strict refresh cookie on the session path', async () => {
    const { access, res } = await signIn(EMAIL.checker);
    expect(res.body.expiresIn).toBe('15m');
    const jwt = claims(access);
    expect(Number(jwt.exp) - Number(jwt.iat)).toBe(15 * 60);
    expect(jwt.sid).toEqual(expect.any(Number));
    const cookie = sessionCookie(res)!;
    expect(cookie.value).toMatch(/^lgr_[A-Za-z0-9_-]{40,}$/);
    expect(cookie.attributes).toEqual(
      expect.arrayContaining(['Path=/api/auth/session', 'HttpOnly', 'SameSite=Strict']),
    );
    // The test service's public address is http://, so the cookie cannot be Secure (see the unit test for https).
    expect(cookie.attributes).not.toContain('Secure');
    const maxAge = Number(cookie.attributes.find((a) => a.startsWith('Max-Age='))?.slice(8));
    expect(maxAge).toBe(168 * 3600);
    // The flag the web app reads to know a session may be restored: no secret, not httpOnly.
    const flag = ((res.headers['set-cookie'] as unknown as string[]) ?? []).find((c) =>
      c.startsWith('ligament_signed_in='),
    );
    expect(flag).toMatch(/^ligament_signed_in=1; Max-Age=604800; Path=\/; Expires=.*; SameSite=Strict$/);
  });

  it('stores only the sha256 of the refresh token', async () => {
    const { cookie } = await signIn(EMAIL.checker);
    const rows = await sql<{ tokenHash: string }>('SELECT tokenHash FROM refresh_tokens');
    expect(rows.some((r) => r.tokenHash.includes(cookie) || cookie.includes(r.tokenHash))).toBe(false);
    expect(rows.every((r) => /^[0-9a-f]{64}$/.test(r.tokenHash))).toBe(true);
  });
});

describe('refresh', () => {
  it('exchanges the cookie for a new access token and a new cookie, for the same session', async () => {
    const { access, cookie } = await signIn(EMAIL.consultant);
    const res = await refresh(cookie);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({
      expiresIn: '15m',
      user: { email: EMAIL.consultant, role: 'consultant' },
    });
    const next = sessionCookie(res);
    expect(next?.value).toMatch(/^lgr_/);
    expect(next?.value).not.toBe(cookie);
    expect(claims(res.body.accessToken as string).sid).toBe(claims(access).sid);
    expect((await me(res.body.accessToken as string)).status).toBe(200);
    // The earlier access token is still good until it expires: the session lives on.
    expect((await me(access)).status).toBe(200);
  });

  it('refuses without a cookie (401)', async () => {
    const res = await refresh(null);
    expect(res.status).toBe(401);
    expect(res.body).toEqual({
      statusCode: 401,
      error: 'Unauthorized',
      message: 'No session in this browser: sign in.',
    });
  });

  it('refuses an unknown cookie with 401 and clears it', async () => {
    const res = await refresh('lgr_not-a-token');
    expect(res.status).toBe(401);
    const cleared = sessionCookie(res);
    expect(cleared?.value).toBe('');
    expect(cleared?.attributes.some((a) => a.startsWith('Expires=Thu, 01 Jan 1970'))).toBe(true);
  });

  it('two tabs refreshing with the same cookie at once both get an access token, and the session lives on', async () => {
    const { cookie } = await signIn(EMAIL.owner);
    const answers = await Promise.all(Array.from({ length: 5 }, () => refresh(cookie)));
    expect(answers.map((r) => r.status)).toEqual([200, 200, 200, 200, 200]);
    // Exactly one of them rotated the token; the others leave the cookie as that one set it.
    const set = answers.map(sessionCookie).filter((c): c is Cookie => c !== null);
    expect(set).toHaveLength(1);
    for (const r of answers) expect((await me(r.body.accessToken as string)).status).toBe(200);
    // No spurious sign-out: the new cookie refreshes again.
    const again = await refresh(set[0]!.value);
    expect(again.status).toBe(200);
    const events = await sql<{ n: number }>(
      "SELECT COUNT(*) AS n FROM events WHERE type = 'session.refresh-reused'",
    );
    expect(events[0]?.n).toBe(0);
  });

  it('ends the whole session when a used token comes back after its successor was used (reuse)', async () => {
    const first = await signIn(EMAIL.admin);
    const second = await refresh(first.cookie);
    const secondCookie = sessionCookie(second)!.value;
    const third = await refresh(secondCookie);
    expect(third.status).toBe(200);
    const thirdCookie = sessionCookie(third)!.value;

    const replay = await refresh(first.cookie);
    expect(replay.status).toBe(401);
    expect(replay.body.message).toBe(
      'This session was ended because an old sign-in token was used again; sign in again.',
    );
    // Every token of the session and every access token it issued are dead now.
    expect((await refresh(thirdCookie)).status).toBe(401);
    expect((await me(third.body.accessToken as string)).status).toBe(401);
    expect((await me(first.access)).status).toBe(401);
    const sid = claims(first.access).sid as number;
    const [session] = await sql<{ endReason: string; endedAt: string | null }>(
      'SELECT endReason, endedAt FROM sessions WHERE id = ?',
      [sid],
    );
    expect(session).toEqual({ endReason: 'refresh-reused', endedAt: expect.any(String) });
    const events = await sql<{ data: string }>(
      "SELECT data FROM events WHERE type = 'session.refresh-reused'",
    );
    expect(events.map((e) => JSON.parse(e.data) as { sessionId: number })).toEqual([
      expect.objectContaining({ sessionId: sid }),
    ]);
    // Another session of the same user is not touched.
    const other = await signIn(EMAIL.admin);
    expect((await me(other.access)).status).toBe(200);
  });
});

describe('cross-site request forgery defence', () => {
  it('refuses refresh and sign-out without the X-Ligament-Session header', async () => {
    const { cookie } = await signIn(EMAIL.checker);
    for (const path of ['/api/auth/session/refresh', '/api/auth/session/sign-out']) {
      const res = await request(base)
        .post(path)
        .set('Origin', ORIGIN)
        .set('Cookie', `ligament_session=${cookie}`);
      expect(res.status).toBe(403);
      expect(res.body).toEqual({
        statusCode: 403,
        error: 'Forbidden',
        message:
          'Session requests must carry the header X-Ligament-Session: 1 (cross-site request forgery defence).',
      });
    }
    // Neither did anything: the cookie still refreshes.
    expect((await refresh(cookie)).status).toBe(200);
  });

  it('refuses a foreign Origin, a foreign Referer and a request with neither', async () => {
    const { cookie } = await signIn(EMAIL.checker);
    const foreign = await refresh(cookie, { 'X-Ligament-Session': '1', Origin: 'https://evil.example.test' });
    expect(foreign.status).toBe(403);
    expect(foreign.body.message).toBe(
      "Session requests must come from this service's own pages (Origin https://evil.example.test is not one of them).",
    );
    const referer = await refresh(cookie, {
      'X-Ligament-Session': '1',
      Referer: 'https://evil.example.test/page',
    });
    expect(referer.status).toBe(403);
    const none = await refresh(cookie, { 'X-Ligament-Session': '1' });
    expect(none.status).toBe(403);
    expect(none.body.message).toContain('(Origin missing is not one of them)');
  });

  it('accepts the public address, the address the request was sent to, and a same-origin Referer', async () => {
    let { cookie } = await signIn(EMAIL.checker);
    const accepted: Record<string, string>[] = [
      { 'X-Ligament-Session': '1', Origin: ORIGIN },
      { 'X-Ligament-Session': '1', Origin: base },
      { 'X-Ligament-Session': '1', Referer: `${ORIGIN}/projects/1` },
    ];
    for (const headers of accepted) {
      const res = await refresh(cookie, headers);
      expect(res.status).toBe(200);
      cookie = sessionCookie(res)!.value;
    }
  });
});

describe('sign-out', () => {
  it('ends the session on the server: its access tokens and its cookie stop working at once', async () => {
    const tabA = await signIn(EMAIL.consultant);
    // A second tab shares the cookie and gets its own access token from it.
    const tabB = await refresh(tabA.cookie);
    const cookie = sessionCookie(tabB)!.value;
    const tabBAccess = tabB.body.accessToken as string;
    expect((await me(tabBAccess)).status).toBe(200);

    const out = await signOut(cookie);
    expect(out.status).toBe(204);
    expect(sessionCookie(out)?.value).toBe('');
    expect((await me(tabA.access)).status).toBe(401);
    expect((await me(tabBAccess)).status).toBe(401);
    const next = await refresh(cookie);
    expect(next.status).toBe(401);
    expect(next.body.message).toBe(
      'This session has ended (signed out elsewhere, or ended by an admin): sign in again.',
    );
    const [session] = await sql<{ endReason: string }>('SELECT endReason FROM sessions WHERE id = ?', [
      claims(tabA.access).sid as number,
    ]);
    expect(session?.endReason).toBe('signed-out');
  });

  it('answers 204 without a session too', async () => {
    const res = await request(base).post('/api/auth/session/sign-out').set(SESSION);
    expect(res.status).toBe(204);
  });

  it('leaves a consultant’s API tokens working (the CLI does not use browser sessions)', async () => {
    const { access, cookie } = await signIn(EMAIL.consultant);
    const created = await request(base)
      .post('/api/tokens')
      .set(bearer(access))
      .send({ name: 'CI after sign-out', projectId: 1 });
    expect(created.status).toBe(201);
    expect((await signOut(cookie)).status).toBe(204);
    const res = await request(base)
      .get('/api/projects/1')
      .set(bearer(created.body.token as string));
    expect(res.status).toBe(200);
  });
});

describe('access tokens', () => {
  it('refuses a correctly signed token without a session id, or naming another user’s session', async () => {
    const now = Math.floor(Date.now() / 1000);
    const checker = await signIn(EMAIL.checker);
    const sid = claims(checker.access).sid as number;
    const mine = handMadeJwt({
      sub: claims(checker.access).sub,
      role: 'checker',
      sid,
      iat: now,
      exp: now + 60,
    });
    expect((await me(mine)).status).toBe(200);
    expect((await me(handMadeJwt({ sub: 1, role: 'admin', iat: now, exp: now + 60 }))).status).toBe(401);
    expect((await me(handMadeJwt({ sub: 1, role: 'admin', sid, iat: now, exp: now + 60 }))).status).toBe(401);
  });
});

describe('an admin deactivating a user', () => {
  it('ends every session of the user at once and records it', async () => {
    const admin = await signIn(EMAIL.admin);
    const invite = await request(base)
      .post('/api/invitations')
      .set(bearer(admin.access))
      .send({ email: 'oren.vale@fennick-ode.example.test', name: 'Oren Vale', role: 'consultant' });
    expect(invite.status).toBe(201);
    const [row] = await sql<{ text: string }>(
      'SELECT text FROM mail_outbox WHERE "to" = \'oren.vale@fennick-ode.example.test\'',
    );
    const token = /\/invitations\/(inv_[A-Za-z0-9_-]+)/.exec(row?.text ?? '')?.[1];
    const accepted = await request(base)
      .post(`/api/invitations/${token}/accept`)
      .send({ password: 'heron-gusset-plate-77' });
    expect(accepted.status).toBe(201);
    const login = () =>
      request(base)
        .post('/api/auth/login')
        .send({ email: 'oren.vale@fennick-ode.example.test', password: 'heron-gusset-plate-77' });
    const laptop = await login();
    const phone = await login();
    const phoneCookie = sessionCookie(phone)!.value;

    const off = await request(base)
      .patch(`/api/users/${accepted.body.id}`)
      .set(bearer(admin.access))
      .send({ active: false });
    expect(off.status).toBe(200);
    expect((await me(laptop.body.accessToken as string)).status).toBe(401);
    expect((await refresh(phoneCookie)).status).toBe(401);
    const sessions = await sql<{ endReason: string | null }>(
      'SELECT endReason FROM sessions WHERE userId = ?',
      [accepted.body.id as number],
    );
    expect(sessions.map((s) => s.endReason)).toEqual(['deactivated', 'deactivated']);
    const [event] = await sql<{ data: string; actorId: number }>(
      "SELECT data, actorId FROM events WHERE type = 'user.deactivated'",
    );
    expect(JSON.parse(event?.data ?? '{}')).toEqual({ userId: accepted.body.id, sessionsEnded: 2 });

    // Active again, the old sessions stay ended; a new sign-in works.
    await request(base)
      .patch(`/api/users/${accepted.body.id}`)
      .set(bearer(admin.access))
      .send({ active: true });
    expect((await refresh(phoneCookie)).status).toBe(401);
    expect((await login()).status).toBe(200);
  });
});
