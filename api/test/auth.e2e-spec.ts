import request from 'supertest';
import { bearer, bootApp, EMAIL, login, type TestApp } from './helpers.js';

let t: TestApp;
beforeAll(async () => {
  t = await bootApp({ LOGIN_THROTTLE_LIMIT: '4' });
});
afterAll(async () => t.close());

it('signs in with the demo password and answers one 401 for a wrong password or an unknown e-mail', async () => {
  const token = await login(t.http, EMAIL.owner);
  expect((await request(t.http).get('/api/auth/me').set(bearer(token))).body).toMatchObject({
    role: 'owner-rep',
    name: 'Adaeze Marlow',
  });
  const wrong = await request(t.http).post('/api/auth/login').send({ email: EMAIL.owner, password: 'nope' });
  const unknown = await request(t.http)
    .post('/api/auth/login')
    .send({ email: 'nobody@example.test', password: 'nope' });
  expect(wrong.status).toBe(401);
  expect(unknown.body).toEqual(wrong.body);
  expect(wrong.body).toEqual({
    statusCode: 401,
    error: 'Unauthorized',
    message: 'E-mail or password is wrong.',
  });
});

it('throttles sign-in attempts per client (429 after the configured limit)', async () => {
  // Two attempts above, then two more reach the limit of 4; the fifth is refused.
  await request(t.http).post('/api/auth/login').send({ email: EMAIL.owner, password: 'nope' });
  await request(t.http).post('/api/auth/login').send({ email: EMAIL.owner, password: 'nope' });
  const res = await request(t.http)
    .post('/api/auth/login')
    .send({ email: EMAIL.owner, password: 'lantern-demo-2026' });
  expect(res.status).toBe(429);
  expect(res.body).toMatchObject({ statusCode: 429, error: 'Too Many Requests' });
  expect((await request(t.http).get('/api/health')).status).toBe(200);
});

it('refuses a forged or missing bearer token with 401', async () => {
  expect((await request(t.http).get('/api/projects')).status).toBe(401);
  expect(
    (await request(t.http).get('/api/projects').set(bearer('eyJhbGciOiJIUzI1NiJ9.e30.forged'))).status,
  ).toBe(401);
});

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
