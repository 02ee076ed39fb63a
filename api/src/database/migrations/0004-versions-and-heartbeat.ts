import type { Sequelize } from 'sequelize';

/**
 * - `version` on discrepancies and submittals: every move and every stamp is a compare-and-set on
 *   (status, version), so of two people acting on the same row at once exactly one wins and the
 *   other is told the row changed.
 * - `storage_heartbeat`: one row that /api/health rewrites, so health reports whether the database
 *   can be written, not only read.
 */
const up = [
  'ALTER TABLE discrepancies ADD COLUMN version INTEGER NOT NULL DEFAULT 0',
  'ALTER TABLE submittals ADD COLUMN version INTEGER NOT NULL DEFAULT 0',
  `CREATE TABLE storage_heartbeat (
    id INTEGER PRIMARY KEY CHECK (id = 1),
    at TEXT NOT NULL
  )`,
];
const down = [
  'DROP TABLE storage_heartbeat',
  'ALTER TABLE submittals DROP COLUMN version',
  'ALTER TABLE discrepancies DROP COLUMN version',
];

export const versionsAndHeartbeat = {
  name: '0004-versions-and-heartbeat',
  async up({ context }: { context: Sequelize }): Promise<void> {
    await context.transaction(async (transaction) => {
      for (const sql of up) await context.query(sql, { transaction });
    });
  },
  async down({ context }: { context: Sequelize }): Promise<void> {
    await context.transaction(async (transaction) => {
      for (const sql of down) await context.query(sql, { transaction });
    });
  },
};
