import { getConnectionToken } from '@nestjs/sequelize';
import type { Sequelize } from 'sequelize-typescript';
import request from 'supertest';
import { findingQuantity } from 'ligament';
import { HotReadsService } from '../src/database/hot-reads.service.js';
import { DISCREPANCY_UNITS_BACKFILL } from '../src/database/migrations/0007-discrepancy-units.js';
import { bearer, bootApp, EMAIL, login, type TestApp } from './helpers.js';

let t: TestApp;
let sequelize: Sequelize;
let reads: HotReadsService;

beforeAll(async () => {
  t = await bootApp();
  sequelize = t.app.get<Sequelize>(getConnectionToken());
  reads = t.app.get(HotReadsService);
});
afterAll(async () => t.close());

type Tally = {
  projectId: number;
  submittalId: number;
  class: string;
  severity: string;
  status: string;
  current: number;
  n: number;
};
const KEY = 'projectId, submittalId, class, severity, status, current';
const KEY_OF_ROWS =
  'projectId, submittalId, class, severity, status, (supersededBySubmittalId IS NULL) AS current';

async function tallies(): Promise<{ kept: Tally[]; counted: Tally[] }> {
  const [kept] = await sequelize.query(`SELECT ${KEY}, n FROM discrepancy_tallies ORDER BY ${KEY}`);
  const [counted] = await sequelize.query(
    `SELECT ${KEY_OF_ROWS}, COUNT(*) AS n FROM discrepancies GROUP BY ${KEY} ORDER BY ${KEY}`,
  );
  return { kept: kept as Tally[], counted: counted as Tally[] };
}

describe('discrepancy tallies (migrations 0003 and 0005)', () => {
  it('match the rows after the demo seed', async () => {
    const { kept, counted } = await tallies();
    expect(counted.length).toBeGreaterThan(0);
    expect(kept).toEqual(counted);
  });

  it('count current and superseded items apart after the demo revision', async () => {
    const { kept } = await tallies();
    expect(kept.some((x) => x.current === 0)).toBe(true);
    expect(kept.some((x) => x.current === 1)).toBe(true);
  });

  it('follow inserts, status moves, re-keying updates and deletes, whoever writes', async () => {
    const [[row]] = (await sequelize.query('SELECT * FROM discrepancies ORDER BY id LIMIT 1')) as [
      Record<string, unknown>[],
      unknown,
    ];
    const cols = Object.keys(row as object).filter((c) => c !== 'id');
    // Three copies: move one, re-class another, touch the third without its key, then delete two.
    await sequelize.query(
      `INSERT INTO discrepancies (${cols.join(', ')}) SELECT ${cols.join(', ')} FROM discrepancies
       WHERE id = :id UNION ALL SELECT ${cols.join(', ')} FROM discrepancies WHERE id = :id
       UNION ALL SELECT ${cols.join(', ')} FROM discrepancies WHERE id = :id`,
      { replacements: { id: row?.id } },
    );
    const [copies] = (await sequelize.query('SELECT id FROM discrepancies ORDER BY id DESC LIMIT 3')) as [
      { id: number }[],
      unknown,
    ];
    const [a, b, c] = copies.map((x) => x.id);
    await sequelize.query("UPDATE discrepancies SET status = 'waived' WHERE id = :a", {
      replacements: { a },
    });
    await sequelize.query("UPDATE discrepancies SET class = 'detailing', severity = 'note' WHERE id = :b", {
      replacements: { b },
    });
    await sequelize.query("UPDATE discrepancies SET message = 'unchanged key' WHERE id = :c", {
      replacements: { c },
    });
    // Superseded and back: the tally moves between current and not.
    await sequelize.query('UPDATE discrepancies SET supersededBySubmittalId = 2 WHERE id = :b', {
      replacements: { b },
    });
    let now = await tallies();
    expect(now.kept).toEqual(now.counted);
    await sequelize.query('UPDATE discrepancies SET supersededBySubmittalId = NULL WHERE id = :b', {
      replacements: { b },
    });
    now = await tallies();
    expect(now.kept).toEqual(now.counted);
    await sequelize.query('DELETE FROM discrepancies WHERE id IN (:ids)', { replacements: { ids: [a, c] } });
    const { kept, counted } = await tallies();
    expect(kept).toEqual(counted);
    expect(kept.every((x) => x.n > 0)).toBe(true);
  });
});

describe('discrepancy units and quantity (migration 0007)', () => {
  type Row = { id: number; code: string; units: string | null; quantity: string | null; numbers: number };
  const rows = async () =>
    (
      await sequelize.query(
        `SELECT id, code, units, quantity, (claimed IS NOT NULL OR recomputed IS NOT NULL) AS numbers
         FROM discrepancies ORDER BY id`,
      )
    )[0] as Row[];

  it('are stored with every finding: the file’s units, and the engine’s quantity when it has numbers', async () => {
    const stored = await rows();
    expect(stored.length).toBeGreaterThan(10);
    const [files] = (await sequelize.query(
      `SELECT d.id, json_extract(c.document, '$.profile.units') AS units
       FROM discrepancies d JOIN calc_files c ON c.id = d.calcFileId ORDER BY d.id`,
    )) as [{ id: number; units: string }[], unknown];
    expect(stored.map((r) => r.units)).toEqual(files.map((f) => f.units));
    expect(stored.map((r) => [r.code, r.quantity])).toEqual(
      stored.map((r) => [r.code, r.numbers ? findingQuantity(r.code) : null]),
    );
    expect(stored.some((r) => r.quantity === 'area') && stored.some((r) => r.quantity === 'force')).toBe(
      true,
    );
  });

  it('are backfilled for rows stored before the migration, as the service stores them', async () => {
    const before = await rows();
    await sequelize.query('UPDATE discrepancies SET units = NULL, quantity = NULL');
    for (const sql of DISCREPANCY_UNITS_BACKFILL) await sequelize.query(sql);
    expect(await rows()).toEqual(before);
  });
});

describe('the read connection', () => {
  it('sees every committed write at once, with several statements prepared', async () => {
    const name = () => reads.get<{ name: string }>('SELECT name FROM projects WHERE id = ?', [1]);
    const count = () => reads.get<{ n: number }>('SELECT COUNT(*) AS n FROM events');
    const before = (await name())?.name;
    const events = (await count())?.n ?? 0;
    await sequelize.transaction(async (transaction) => {
      await sequelize.query("UPDATE projects SET name = name || ' (renamed)' WHERE id = 1", { transaction });
    });
    expect((await name())?.name).toBe(`${before} (renamed)`);
    const admin = await login(t.http, EMAIL.admin);
    await request(t.http).patch('/api/projects/1').set(bearer(admin)).send({ name: before }).expect(200);
    expect((await name())?.name).toBe(before);
    expect((await count())?.n).toBeGreaterThan(events);
  });

  it('keeps answering while more distinct statements than it caches run at once', async () => {
    // 200 texts against a cache of 64: statements are evicted while reads on them are in flight.
    const texts = Array.from({ length: 200 }, (_, i) => `SELECT ${i} AS i, COUNT(*) AS n FROM users`);
    const rows = await Promise.all(
      [...texts, ...texts].map((sql) => reads.get<{ i: number; n: number }>(sql)),
    );
    expect(rows.map((r) => r?.i)).toEqual([...texts.keys(), ...texts.keys()]);
    expect(new Set(rows.map((r) => r?.n)).size).toBe(1);
  });

  it('is read-only and reports a bad statement as an error', async () => {
    await expect(reads.all('DELETE FROM events')).rejects.toThrow(/readonly|read-only/i);
    await expect(reads.all('SELECT nope FROM nowhere')).rejects.toThrow(/no such table/);
  });
});
