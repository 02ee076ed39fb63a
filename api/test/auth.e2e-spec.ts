import { createHmac } from 'node:crypto';
import request from 'supertest';
import { AuthService } from '../src/auth/auth.service.js';
import { Role } from '../src/auth/role.enum.js';
import { DEMO_JWT_SECRET, validateEnvironment } from '../src/config/index.js';
import { InvitationsService } from '../src/users/invitations.service.js';
import { bearer, bootApp, DEMO_PASSWORD, EMAIL, login, type TestApp } from './helpers.js';

const SECRET = 'test-secret-0123456789abcdef';

let t: TestApp;
beforeAll(async () => {
  // Failed sign-ins: at most 2 per account and 6 per address in the window.
  t = await bootApp({
    LOGIN_THROTTLE_LIMIT: '6',
    LOGIN_ACCOUNT_THROTTLE_LIMIT: '2',
    JWT_SECRET: SECRET,
  });
});
afterAll(async () => t.close());

const signIn = (email: string, password: string) =>
  request(t.http).post('/api/auth/login').send({ email, password });

/** An HS256 JWT made by hand, so a test can leave out claims the service's signer always sets. */
function handMadeJwt(payload: Record<string, unknown>, secret = SECRET): string {
  const part = (o: object) => Buffer.from(JSON.stringify(o)).toString('base64url');
  const head = `${part({ alg: 'HS256', typ: 'JWT' })}.${part(payload)}`;
  return `${head}.${createHmac('sha256', secret).update(head).digest('base64url')}`;
}

const ADMIN_USER = { id: 1, email: EMAIL.admin, name: 'Sam Oduya', role: Role.Admin, organisationId: null };

/** A new consultant account with a password of its own; deactivated by the admin when asked. */
async function newAccount(email: string, password: string, deactivate = false): Promise<string> {
  const { token } = await t.app
    .get(InvitationsService)
    .create({ email, name: 'Inez Former', role: Role.Consultant }, ADMIN_USER);
  const accepted = await request(t.http).post(`/api/invitations/${token}/accept`).send({ password });
  expect(accepted.status).toBe(201);
  if (deactivate) {
    const admin = await login(t.http, EMAIL.admin);
    const off = await request(t.http)
      .patch(`/api/users/${(accepted.body as { id: number }).id}`)
      .set(bearer(admin))
      .send({ active: false });
    expect(off.status).toBe(200);
  }
  return email;
}

/** AuthService.login called directly with an address of the test's choosing: its HTTP status. */
const attempt = (email: string, password: string, address: string) =>
  t.app
    .get(AuthService)
    .login({ email, password }, address)
    .then(
      () => 200,
      (e: { getStatus(): number }) => e.getStatus(),
    );

describe('sign-in', () => {
  it('signs in with the demo password and answers one 401 for a wrong password or an unknown e-mail', async () => {
    const token = await login(t.http, EMAIL.owner);
    expect((await request(t.http).get('/api/auth/me').set(bearer(token))).body).toMatchObject({
      role: 'owner-rep',
      name: 'Adaeze Marlow',
    });
    const wrong = await signIn(EMAIL.owner, 'nope');
    const unknown = await signIn('nobody@example.test', 'nope');
    expect(wrong.status).toBe(401);
    expect(unknown.body).toEqual(wrong.body);
    expect(wrong.body).toEqual({
      statusCode: 401,
      error: 'Unauthorized',
      message: 'E-mail or password is wrong.',
    });
    // A good sign-in clears the account's failures (the address keeps its 2).
    await login(t.http, EMAIL.owner);
  });

  it('hashes a dummy password for unknown and inactive accounts, so they cost what a known one does', async () => {
    const inactive = await newAccount('inez.former@fennick-ode.example.test', 'heron-gusset-plate-41', true);
    const dummy = jest.spyOn(t.app.get(AuthService), 'verifyDummy');
    // Each from its own address: these attempts stay out of the HTTP address count.
    expect(await attempt('nobody-here@example.test', 'whatever-it-is', 'dummy-1')).toBe(401);
    expect(dummy).toHaveBeenCalledTimes(1);
    expect(await attempt(inactive, 'heron-gusset-plate-41', 'dummy-2')).toBe(401);
    expect(dummy).toHaveBeenCalledTimes(2);
    expect(await attempt(EMAIL.checker, 'not-the-password', 'dummy-3')).toBe(401);
    expect(await attempt(EMAIL.checker, DEMO_PASSWORD, 'dummy-4')).toBe(200);
    expect(dummy).toHaveBeenCalledTimes(2); // a known, active account checks its own hash
    dummy.mockRestore();
  });

  it('counts failures per account whatever the address', async () => {
    const email = await newAccount('ravi.locked@fennick-ode.example.test', 'heron-gusset-plate-42');
    expect(await attempt(email, 'wrong-one', '10.0.0.1')).toBe(401);
    expect(await attempt(email, 'wrong-two', '10.0.0.2')).toBe(401);
    // Two failures reach the account limit: even the right password from a third address waits.
    expect(await attempt(email, 'heron-gusset-plate-42', '10.0.0.3')).toBe(429);
    // Other accounts from those addresses are not affected.
    expect(await attempt(EMAIL.checker, DEMO_PASSWORD, '10.0.0.1')).toBe(200);
  });
});

describe('tokens', () => {
  it('refuses a forged or missing bearer token with 401', async () => {
    expect((await request(t.http).get('/api/projects')).status).toBe(401);
    expect(
      (await request(t.http).get('/api/projects').set(bearer('eyJhbGciOiJIUzI1NiJ9.e30.forged'))).status,
    ).toBe(401);
    const otherSecret = handMadeJwt(
      { sub: 1, role: 'admin', exp: Math.floor(Date.now() / 1000) + 600 },
      'another-secret-0123456789',
    );
    expect((await request(t.http).get('/api/projects').set(bearer(otherSecret))).status).toBe(401);
  });

  it('refuses a correctly signed token without exp (it would never expire)', async () => {
    const now = Math.floor(Date.now() / 1000);
    // The session id of a real sign-in of the admin (user 1): access tokens must name a live session.
    const signedIn = await login(t.http, EMAIL.admin);
    const { sid } = JSON.parse(Buffer.from(signedIn.split('.')[1] ?? '', 'base64url').toString()) as {
      sid: number;
    };
    const withExp = handMadeJwt({ sub: 1, role: 'admin', sid, iat: now, exp: now + 600 });
    expect((await request(t.http).get('/api/auth/me').set(bearer(withExp))).status).toBe(200);
    const forever = handMadeJwt({ sub: 1, role: 'admin', sid, iat: now });
    const res = await request(t.http).get('/api/auth/me').set(bearer(forever));
    expect(res.status).toBe(401);
    expect(res.body).toEqual({
      statusCode: 401,
      error: 'Unauthorized',
      message: 'Sign in first: this route needs a valid bearer token.',
    });
  });

  it('revokes a member’s API tokens for a project when they are removed from it', async () => {
    const admin = await login(t.http, EMAIL.admin);
    const consultant = await login(t.http, EMAIL.consultant);
    const me = (await request(t.http).get('/api/auth/me').set(bearer(consultant))).body as { id: number };
    const created = await request(t.http)
      .post('/api/tokens')
      .set(bearer(consultant))
      .send({ name: 'CI', projectId: 1 });
    expect(created.status).toBe(201);
    const { token, id } = created.body as { token: string; id: number };
    expect((await request(t.http).get('/api/projects/1').set(bearer(token))).status).toBe(200);

    const removed = await request(t.http).delete(`/api/projects/1/members/${me.id}`).set(bearer(admin));
    expect(removed.status).toBe(200);
    const mine = (await request(t.http).get('/api/tokens').set(bearer(consultant))).body as {
      id: number;
      revokedAt: string | null;
    }[];
    expect(mine.find((x) => x.id === id)?.revokedAt).toEqual(expect.any(String));
    const events = await request(t.http).get('/api/projects/1/events').set(bearer(admin));
    const types = (events.body as { items: { type: string; data: Record<string, unknown> }[] }).items;
    expect(types).toEqual(
      expect.arrayContaining([
        expect.objectContaining({ type: 'token.revoked', data: expect.objectContaining({ tokenId: id }) }),
      ]),
    );

    // Back on the project, the old token stays revoked.
    const readded = await request(t.http)
      .post('/api/projects/1/members')
      .set(bearer(admin))
      .send({ userId: me.id });
    expect(readded.status).toBe(201);
    const refused = await request(t.http).get('/api/projects/1').set(bearer(token));
    expect(refused.status).toBe(401);
    expect(refused.body).toEqual({
      statusCode: 401,
      error: 'Unauthorized',
      message: 'The API token is unknown or has been revoked.',
    });
  });
});

describe('demo mailbox and secrets', () => {
  it('shows the demo mailbox (with its invitation links) to an admin only', async () => {
    expect((await request(t.http).get('/api/mail/mailbox')).status).toBe(401);
    const consultant = await login(t.http, EMAIL.consultant);
    const refused = await request(t.http).get('/api/mail/mailbox').set(bearer(consultant));
    expect(refused.status).toBe(403);
    expect(refused.body).toMatchObject({ statusCode: 403, error: 'Forbidden' });
    const admin = await login(t.http, EMAIL.admin);
    const ok = await request(t.http).get('/api/mail/mailbox').set(bearer(admin));
    expect(ok.status).toBe(200);
    expect(Array.isArray(ok.body)).toBe(true);
  });

  it('outside demo mode refuses to start without its own JWT_SECRET, saying what to set', () => {
    expect(() => validateEnvironment({ LIGAMENT_DEMO: 'false' })).toThrow(
      /JWT_SECRET: required when LIGAMENT_DEMO=false: set 16\+ random characters/,
    );
    expect(() => validateEnvironment({ LIGAMENT_DEMO: 'false', JWT_SECRET: DEMO_JWT_SECRET })).toThrow(
      /JWT_SECRET: is the public demo secret/,
    );
    expect(() => validateEnvironment({ LIGAMENT_DEMO: 'false', JWT_SECRET: 'x'.repeat(32) })).not.toThrow();
    expect(() => validateEnvironment({})).not.toThrow(); // the demo keeps its default
  });

  it('health reports demo mode and no warnings with a real secret', async () => {
    const res = await request(t.http).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ demo: true, warnings: [] });
  });
});

describe('passwords', () => {
  let n = 0;
  const invite = async (name: string) =>
    (
      await t.app
        .get(InvitationsService)
        .create(
          { email: `invitee-${++n}@larchmont-review.example.test`, name, role: Role.Checker },
          ADMIN_USER,
        )
    ).token;
  const COMMON = 'is one of the most common passwords (or one with digits or symbols added)';

  it.each([
    ['a common password', 'qwertyuiop', COMMON],
    ['a common password with digits and symbols added', 'Password2026!', COMMON],
    ['a repeated character', 'zzzzzzzzzzzz', 'repeats too few different characters'],
    ['a run of letters', 'defghijklmnop', 'is a run of keys or letters'],
    ['the name', 'Castellan-review', 'contains your e-mail, your name or the service name'],
    ['the service name', 'my-ligament-pass', 'contains your e-mail, your name or the service name'],
  ])('refuses %s with 400 and the rule', async (_what, password, rule) => {
    const token = await invite('Noor Castellan');
    const res = await request(t.http).post(`/api/invitations/${token}/accept`).send({ password });
    expect(res.status).toBe(400);
    expect(res.body).toEqual({
      statusCode: 400,
      error: 'Bad Request',
      message: `The password ${rule}; choose another.`,
      details: [{ property: 'password', constraints: { passwordRules: `password ${rule}; choose another` } }],
    });
  });

  it('accepts a long uncommon passphrase', async () => {
    const token = await invite('Noor Castellan');
    const res = await request(t.http)
      .post(`/api/invitations/${token}/accept`)
      .send({ password: 'heron gusset plate forty-one' });
    expect(res.status).toBe(201);
  });
});

describe('surface', () => {
  it('answers unknown API paths with the error shape and sets helmet headers', async () => {
    const res = await request(t.http).get('/api/no-such-route');
    expect(res.status).toBe(404);
    expect(res.body).toEqual({ statusCode: 404, error: 'Not Found', message: expect.any(String) });
    expect(res.headers['x-content-type-options']).toBe('nosniff');
  });

  it('publishes an OpenAPI document with every route', async () => {
    const res = await request(t.http).get('/api/docs-json');
    expect(res.status).toBe(200);
    const paths = Object.keys(res.body.paths as object);
    for (const p of [
      '/api/projects/{projectId}/submittals',
      '/api/discrepancies/{discrepancyId}/transitions',
      '/api/submittals/{submittalId}/stamp',
      '/api/health',
      '/api/dashboard',
    ]) {
      expect(paths).toContain(p);
    }
    expect((await request(t.http).get('/api/docs')).status).toBe(200);
  });
});

// Last: it locks the test client's address for the rest of the window.
describe('sign-in throttling', () => {
  it('does not count successful sign-ins; failures lock the account, then the address, with Retry-After', async () => {
    for (let i = 0; i < 8; i++) expect((await signIn(EMAIL.owner, DEMO_PASSWORD)).status).toBe(200);

    expect((await signIn(EMAIL.checker, 'nope')).status).toBe(401);
    expect((await signIn(EMAIL.checker, 'nope')).status).toBe(401);
    const locked = await signIn(EMAIL.checker, DEMO_PASSWORD);
    expect(locked.status).toBe(429);
    expect(locked.body).toEqual({
      statusCode: 429,
      error: 'Too Many Requests',
      message: expect.stringMatching(
        /^Too many failed sign-ins for this account or from this address; try again in \d+ s\.$/,
      ),
    });
    const seconds = Number(locked.headers['retry-after']);
    expect(seconds).toBeGreaterThan(0);
    expect(seconds).toBeLessThanOrEqual(60);
    expect(Object.keys(locked.headers).filter((h) => h.startsWith('retry-after-'))).toEqual([]);

    // Another account from the same address still signs in: the address has 4 failures of 6.
    expect((await signIn(EMAIL.admin, DEMO_PASSWORD)).status).toBe(200);
    expect((await signIn('guess-1@example.test', 'nope')).status).toBe(401);
    expect((await signIn('guess-2@example.test', 'nope')).status).toBe(401);
    const address = await signIn(EMAIL.admin, DEMO_PASSWORD);
    expect(address.status).toBe(429);
    expect(Number(address.headers['retry-after'])).toBeGreaterThan(0);
    expect((await request(t.http).get('/api/health')).status).toBe(200);
  });
});

// After every other test: a second app rebinds the Sequelize models, so the first is done by then.
describe('with the demo secret', () => {
  let demo: TestApp;
  beforeAll(async () => {
    demo = await bootApp({ JWT_SECRET: DEMO_JWT_SECRET });
  });
  afterAll(async () => demo.close());

  it('health warns that the demo secret is in use', async () => {
    const res = await request(demo.http).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({
      demo: true,
      warnings: [expect.stringContaining('JWT_SECRET is the public demo secret: anyone can forge a sign-in')],
    });
  });
});
