import { Logger } from '@nestjs/common';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { rmSync } from 'node:fs';
import { join } from 'node:path';
import request from 'supertest';
import { bearer, bootApp, DEMO_PASSWORD, EMAIL, login } from './helpers.js';

/**
 * The database failing under the service. A read-only file is opened read-only (as SQLite does for a
 * write-protected file; the tests may run as root, whom chmod does not stop), through a `file:` URI
 * with `mode=ro`.
 */
let dir = '';
let dbFile = '';
let app: NestExpressApplication | null = null;
const errors: string[] = [];
/** The checker's access token from a sign-in made while the database could still be written. */
let checker = '';

async function start(storage: string): Promise<NestExpressApplication> {
  process.env.LIGAMENT_DB = storage;
  const { createApp } = await import('../src/create-app.js');
  app = await createApp({ logger: false });
  return app;
}

beforeAll(async () => {
  // A seeded database, closed again: the faults are made on a database that was fine.
  const seeded = await bootApp();
  dir = seeded.dir;
  dbFile = join(dir, 'test.sqlite');
  // A sign-in stores its session, so it is made before the faults; its token names that session.
  checker = await login(seeded.http, EMAIL.checker);
  await seeded.app.close();
  jest
    .spyOn(Logger.prototype, 'error')
    .mockImplementation((message: unknown) => void errors.push(String(message)));
});
afterEach(async () => {
  await app?.close();
  app = null;
  errors.length = 0;
});
afterAll(() => {
  jest.restoreAllMocks();
  rmSync(dir, { recursive: true, force: true });
});

describe('a read-only database', () => {
  it('health is down (503, not writable); reads still work; a write is 503 with its cause logged', async () => {
    const http = (await start(`file:${dbFile}?mode=ro`)).getHttpServer();
    const health = await request(http).get('/api/health');
    expect(health.status).toBe(503);
    expect(health.body.status).toBe('down');
    expect(health.body.database).toMatchObject({ ok: false, writable: false });
    expect(health.body.database.error).toMatch(/readonly/);

    // A new sign-in would store a session: refused whole, with the cause, like any other write.
    const signIn = await request(http)
      .post('/api/auth/login')
      .send({ email: EMAIL.checker, password: DEMO_PASSWORD });
    expect(signIn.status).toBe(503);
    expect(signIn.body.message).toMatch(/cannot be written .*readonly.*nothing was stored/);
    // Someone already signed in goes on reading.
    const list = await request(http).get('/api/projects/1/discrepancies?status=open').set(bearer(checker));
    expect(list.status).toBe(200);
    const id = (list.body.items as { id: number; status: string }[]).find((d) => d.status === 'raised')?.id;
    const write = await request(http)
      .post(`/api/discrepancies/${id}/transitions`)
      .set(bearer(checker))
      .send({ to: 'waived', note: 'Accepted as detailed.' });
    expect(write.status).toBe(503);
    expect(write.body).toMatchObject({ statusCode: 503, error: 'Service Unavailable' });
    expect(write.body.message).toMatch(/cannot be written .*readonly.*nothing was stored/);
    expect(errors.some((e) => e.includes('SQLITE_READONLY'))).toBe(true);
  });
});
