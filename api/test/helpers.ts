import type { NestExpressApplication } from '@nestjs/platform-express';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import sqlite3 from 'sqlite3';
import type { Server } from 'node:http';

export const DEMO_PASSWORD = 'lantern-demo-2026';
export const EMAIL = {
  admin: 'sam@tidewater-crossing.example.test',
  consultant: 'priya@fennick-ode.example.test',
  checker: 'tomasz@larchmont-review.example.test',
  owner: 'adaeze@tidewater-crossing.example.test',
} as const;

export interface TestApp {
  app: NestExpressApplication;
  http: Server;
  dir: string;
  close(): Promise<void>;
}

/**
 * Boots the real AppModule on a temporary SQLite file with the demo seed, the SMTP fake on a free
 * port and the outbox worker off. `env` overrides settings for one suite (set before the import, so
 * the config factories see them).
 */
export async function bootApp(env: Record<string, string> = {}): Promise<TestApp> {
  const dir = mkdtempSync(join(tmpdir(), 'ligament-e2e-'));
  Object.assign(process.env, {
    LIGAMENT_DB: join(dir, 'test.sqlite'),
    LIGAMENT_DEMO: 'true',
    LIGAMENT_WEB_DIST: join(dir, 'no-web'),
    LIGAMENT_PUBLIC_URL: 'http://ligament.test',
    SMTP_FAKE: 'true',
    SMTP_FAKE_PORT: '0',
    MAIL_RETRY_INTERVAL_MS: '0',
    JWT_SECRET: 'test-secret-0123456789abcdef',
    LOGIN_THROTTLE_LIMIT: '1000',
    LOGIN_ACCOUNT_THROTTLE_LIMIT: '1000',
    THROTTLE_LIMIT: '100000',
    ...env,
  });
  const { createApp } = await import('../src/create-app.js');
  const { SeedService } = await import('../src/seed/seed.service.js');
  const app = await createApp({ logger: false });
  await app.get(SeedService).seedIfEmpty();
  return {
    app,
    http: app.getHttpServer() as Server,
    dir,
    async close() {
      await app.close();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

export async function login(http: Server, email: string, password = DEMO_PASSWORD): Promise<string> {
  const res = await request(http).post('/api/auth/login').send({ email, password });
  if (res.status !== 200) throw new Error(`login ${email}: ${res.status} ${JSON.stringify(res.body)}`);
  return (res.body as { accessToken: string }).accessToken;
}

/** A valid calc file (one splice plate), with a name and an id of your choosing. */
export function calcFile(memberId = 'SP-T1', overrides: Record<string, unknown> = {}): Buffer {
  const doc = {
    $schema: 'urn:ligament:schema:calc:1.0',
    format: 'ligament-calc',
    formatVersion: '1.0',
    meta: { project: 'Harbour Lantern Footbridge', preparedBy: 'Priya Halvorsen', date: '2026-11-20' },
    units: 'in',
    code: { standard: 'AISC 360-22', method: 'LRFD' },
    members: [
      {
        id: memberId,
        kind: 'plate',
        width: 12,
        thickness: '1/2',
        material: { grade: 'A36', Fy: 36, Fu: 58 },
        holes: [
          { id: 'A1', x: 0, y: 3, bolt: '3/4' },
          { id: 'B1', x: 0, y: 9, bolt: '3/4' },
        ],
        load: { directions: ['-x'], U: 1.0 },
        claims: { An: 5.125 },
        ...overrides,
      },
    ],
  };
  return Buffer.from(JSON.stringify(doc, null, 2));
}

export function bearer(token: string): { Authorization: string } {
  return { Authorization: `Bearer ${token}` };
}

/**
 * Rows from the test app's database file, read on a read-only connection of the test's own (not
 * through the service), so a test sees what was committed.
 */
export function readDatabase<T>(t: TestApp, query: string, params: (string | number)[] = []): Promise<T[]> {
  return new Promise((resolve, reject) => {
    const db = new sqlite3.Database(join(t.dir, 'test.sqlite'), sqlite3.OPEN_READONLY, (err) => {
      if (err) return reject(err);
      db.all(query, params, (e: Error | null, rows: T[]) => db.close(() => (e ? reject(e) : resolve(rows))));
    });
  });
}
