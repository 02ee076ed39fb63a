import type { Sequelize } from 'sequelize';

/**
 * The review as people work it:
 * - discrepancies carry across revisions: `carriedFromId` (the item of the revised submittal this one
 *   continues), `supersededBySubmittalId` (set once a later revision re-checked the item: it was
 *   carried on, or closed as `resolved`). Current = not superseded. The status check gains
 *   `resolved`, which SQLite can only do by rebuilding the table (sqlite.org/lang_altertable.html,
 *   "other kinds of table schema changes"): new table, copy, drop, rename, with foreign keys off
 *   and checked before the commit.
 * - `firstRaisedAt`: when the first submittal of the lineage raised the item (ages count from it).
 * - `assigneeId` and `dueDate` (YYYY-MM-DD) on a discrepancy.
 * - the tally table of 0003 gains `current`, so the counts of current items stay a sum of a few rows.
 * - `submittals.reconciled`: whether a revision's items have been carried across (existing
 *   revisions are reconciled once at start-up, see DiscrepancyRevisionsService).
 * - `notifications` (the in-app list) and `notification_settings` (per user and kind, in-app and mail).
 */
const SEVERITY_RANK = "(CASE severity WHEN 'error' THEN 0 WHEN 'warning' THEN 1 ELSE 2 END)";
const TALLY_KEY = ['projectId', 'submittalId', 'class', 'severity', 'status', 'current'] as const;
const tallyValues = (row: 'OLD' | 'NEW') =>
  [
    `${row}.projectId`,
    `${row}.submittalId`,
    `${row}.class`,
    `${row}.severity`,
    `${row}.status`,
    `(${row}.supersededBySubmittalId IS NULL)`,
  ].join(', ');
const tallyMatches = (row: 'OLD') =>
  TALLY_KEY.map(
    (c) => `${c} = ${c === 'current' ? `(${row}.supersededBySubmittalId IS NULL)` : `${row}.${c}`}`,
  ).join(' AND ');
const tallyAdd = (row: 'NEW') =>
  `INSERT INTO discrepancy_tallies (${TALLY_KEY.join(', ')}, n) VALUES (${tallyValues(row)}, 1)
     ON CONFLICT (${TALLY_KEY.join(', ')}) DO UPDATE SET n = n + 1;`;
const tallyRemove = (row: 'OLD') =>
  `DELETE FROM discrepancy_tallies WHERE ${tallyMatches(row)} AND n = 1;
   UPDATE discrepancy_tallies SET n = n - 1 WHERE ${tallyMatches(row)};`;
const TALLIED_COLUMNS = [
  'projectId',
  'submittalId',
  'class',
  'severity',
  'status',
  'supersededBySubmittalId',
];

const OLD_COLUMNS = [
  'id',
  'projectId',
  'submittalId',
  'calcFileId',
  'fileName',
  'memberId',
  'code',
  'name',
  'class',
  'severity',
  'direction',
  'chain',
  'claimed',
  'recomputed',
  'message',
  'pointer',
  'status',
  'acknowledgedAt',
  'acknowledgedById',
  'createdAt',
  'updatedAt',
  'version',
].join(', ');

const up = [
  `CREATE TABLE discrepancies_0005 (
    id INTEGER PRIMARY KEY AUTOINCREMENT,
    projectId INTEGER NOT NULL REFERENCES projects(id),
    submittalId INTEGER NOT NULL REFERENCES submittals(id),
    calcFileId INTEGER NOT NULL REFERENCES calc_files(id),
    fileName TEXT NOT NULL,
    memberId TEXT,
    code TEXT NOT NULL,
    name TEXT NOT NULL,
    class TEXT NOT NULL,
    severity TEXT NOT NULL CHECK (severity IN ('error','warning','note')),
    direction TEXT,
    chain TEXT,
    claimed REAL,
    recomputed REAL,
    message TEXT NOT NULL,
    pointer TEXT NOT NULL,
    status TEXT NOT NULL CHECK (status IN ('raised','answered','accepted','returned','waived','resolved')),
    acknowledgedAt DATETIME,
    acknowledgedById INTEGER REFERENCES users(id),
    createdAt DATETIME NOT NULL, updatedAt DATETIME NOT NULL,
    version INTEGER NOT NULL DEFAULT 0,
    carriedFromId INTEGER REFERENCES discrepancies(id),
    supersededBySubmittalId INTEGER REFERENCES submittals(id),
    firstRaisedAt DATETIME NOT NULL,
    assigneeId INTEGER REFERENCES users(id),
    dueDate TEXT CHECK (dueDate IS NULL OR dueDate GLOB '[0-9][0-9][0-9][0-9]-[0-1][0-9]-[0-3][0-9]'))`,
  `INSERT INTO discrepancies_0005 (${OLD_COLUMNS}, firstRaisedAt)
     SELECT ${OLD_COLUMNS}, createdAt FROM discrepancies`,
  // Dropping the table drops its triggers and indexes too; the tally table is rebuilt below.
  'DROP TABLE discrepancies',
  'ALTER TABLE discrepancies_0005 RENAME TO discrepancies',
  `CREATE INDEX discrepancies_project ON discrepancies (projectId, id)`,
  `CREATE INDEX discrepancies_submittal ON discrepancies (submittalId, id)`,
  `CREATE INDEX discrepancies_project_status ON discrepancies (projectId, status)`,
  // 0003's covering index, with what "current" is read from.
  `CREATE INDEX discrepancies_project_severity_status ON discrepancies
    (projectId, ${SEVERITY_RANK}, id, status, supersededBySubmittalId)`,
  `CREATE INDEX discrepancies_carried_from ON discrepancies (carriedFromId) WHERE carriedFromId IS NOT NULL`,
  'DROP TABLE discrepancy_tallies',
  `CREATE TABLE discrepancy_tallies (
    projectId INTEGER NOT NULL,
    submittalId INTEGER NOT NULL,
    class TEXT NOT NULL,
    severity TEXT NOT NULL,
    status TEXT NOT NULL,
    current INTEGER NOT NULL,
    n INTEGER NOT NULL CHECK (n > 0),
    PRIMARY KEY (${TALLY_KEY.join(', ')})) WITHOUT ROWID`,
  `INSERT INTO discrepancy_tallies (${TALLY_KEY.join(', ')}, n)
     SELECT projectId, submittalId, class, severity, status, (supersededBySubmittalId IS NULL), COUNT(*)
     FROM discrepancies GROUP BY 1, 2, 3, 4, 5, 6`,
  `CREATE TRIGGER discrepancies_tally_insert AFTER INSERT ON discrepancies BEGIN
     ${tallyAdd('NEW')}
   END`,
  `CREATE TRIGGER discrepancies_tally_delete AFTER DELETE ON discrepancies BEGIN
     ${tallyRemove('OLD')}
   END`,
  `CREATE TRIGGER discrepancies_tally_update AFTER UPDATE OF ${TALLIED_COLUMNS.join(', ')} ON discrepancies
   WHEN ${TALLIED_COLUMNS.filter((c) => c !== 'supersededBySubmittalId')
     .map((c) => `OLD.${c} IS NOT NEW.${c}`)
     .join(' OR ')}
     OR (OLD.supersededBySubmittalId IS NULL) IS NOT (NEW.supersededBySubmittalId IS NULL) BEGIN
     ${tallyRemove('OLD')}
     ${tallyAdd('NEW')}
   END`,
  'ALTER TABLE submittals ADD COLUMN reconciled INTEGER NOT NULL DEFAULT 0',
  // A submittal that revises nothing has nothing to carry across.
  'UPDATE submittals SET reconciled = 1 WHERE revisionOfId IS NULL',
  `CREATE TABLE notifications (
    id INTEGER PRIMARY KEY AUTOINCREMENT,
    userId INTEGER NOT NULL REFERENCES users(id),
    kind TEXT NOT NULL,
    projectId INTEGER REFERENCES projects(id),
    submittalId INTEGER REFERENCES submittals(id),
    discrepancyId INTEGER REFERENCES discrepancies(id),
    actorId INTEGER REFERENCES users(id),
    title TEXT NOT NULL,
    body TEXT NOT NULL,
    webPath TEXT NOT NULL,
    readAt DATETIME,
    createdAt DATETIME NOT NULL)`,
  'CREATE INDEX notifications_user ON notifications (userId, id)',
  'CREATE INDEX notifications_user_unread ON notifications (userId) WHERE readAt IS NULL',
  `CREATE TABLE notification_settings (
    userId INTEGER NOT NULL REFERENCES users(id) ON DELETE CASCADE,
    kind TEXT NOT NULL,
    inApp TINYINT(1) NOT NULL,
    mail TINYINT(1) NOT NULL,
    updatedAt DATETIME NOT NULL,
    PRIMARY KEY (userId, kind)) WITHOUT ROWID`,
];

interface RawConnection {
  exec(sql: string, callback: (err: Error | null) => void): void;
  all(sql: string, callback: (err: Error | null, rows: unknown[]) => void): void;
}

const exec = (db: RawConnection, sql: string) =>
  new Promise<void>((resolve, reject) => db.exec(sql, (err) => (err ? reject(err) : resolve())));
const all = (db: RawConnection, sql: string) =>
  new Promise<unknown[]>((resolve, reject) =>
    db.all(sql, (err, rows) => (err ? reject(err) : resolve(rows))),
  );

/**
 * The connection every write uses (DatabaseService's writer; the one connection of an in-memory
 * database). Foreign keys can only be switched off outside a transaction, so this migration drives
 * the connection itself: it runs at start-up, before anything else writes.
 */
async function writer(context: Sequelize): Promise<RawConnection> {
  const manager = context.connectionManager as unknown as {
    getConnection(options: { uuid: string }): Promise<RawConnection>;
  };
  return manager.getConnection({ uuid: 'writer' });
}

async function rebuild(context: Sequelize, statements: readonly string[]): Promise<void> {
  const db = await writer(context);
  await exec(db, 'PRAGMA foreign_keys = OFF');
  try {
    await exec(db, 'BEGIN IMMEDIATE');
    try {
      for (const sql of statements) await exec(db, sql);
      const broken = await all(db, 'PRAGMA foreign_key_check');
      if (broken.length > 0)
        throw new Error(`0005: ${broken.length} foreign key(s) would break: ${JSON.stringify(broken[0])}`);
      await exec(db, 'COMMIT');
    } catch (error) {
      await exec(db, 'ROLLBACK').catch(() => undefined);
      throw error;
    }
  } finally {
    await exec(db, 'PRAGMA foreign_keys = ON');
  }
}

const down = [
  'DROP TABLE notification_settings',
  'DROP TABLE notifications',
  'ALTER TABLE submittals DROP COLUMN reconciled',
  // Back to 0004's table: resolved items return to the status they had before the revision closed them is
  // not known, so they come back as raised; carried and assignment columns are dropped.
  `CREATE TABLE discrepancies_0004 (
    id INTEGER PRIMARY KEY AUTOINCREMENT,
    projectId INTEGER NOT NULL REFERENCES projects(id),
    submittalId INTEGER NOT NULL REFERENCES submittals(id),
    calcFileId INTEGER NOT NULL REFERENCES calc_files(id),
    fileName TEXT NOT NULL,
    memberId TEXT,
    code TEXT NOT NULL,
    name TEXT NOT NULL,
    class TEXT NOT NULL,
    severity TEXT NOT NULL CHECK (severity IN ('error','warning','note')),
    direction TEXT,
    chain TEXT,
    claimed REAL,
    recomputed REAL,
    message TEXT NOT NULL,
    pointer TEXT NOT NULL,
    status TEXT NOT NULL CHECK (status IN ('raised','answered','accepted','returned','waived')),
    acknowledgedAt DATETIME,
    acknowledgedById INTEGER REFERENCES users(id),
    createdAt DATETIME NOT NULL, updatedAt DATETIME NOT NULL,
    version INTEGER NOT NULL DEFAULT 0)`,
  `INSERT INTO discrepancies_0004 (${OLD_COLUMNS})
     SELECT ${OLD_COLUMNS.replace('status', "CASE status WHEN 'resolved' THEN 'raised' ELSE status END")}
     FROM discrepancies`,
  'DROP TABLE discrepancies',
  'ALTER TABLE discrepancies_0004 RENAME TO discrepancies',
  `CREATE INDEX discrepancies_project ON discrepancies (projectId, id)`,
  `CREATE INDEX discrepancies_submittal ON discrepancies (submittalId, id)`,
  `CREATE INDEX discrepancies_project_status ON discrepancies (projectId, status)`,
  `CREATE INDEX discrepancies_project_severity_status ON discrepancies (projectId, ${SEVERITY_RANK}, id, status)`,
  'DROP TABLE discrepancy_tallies',
  `CREATE TABLE discrepancy_tallies (
    projectId INTEGER NOT NULL, submittalId INTEGER NOT NULL, class TEXT NOT NULL,
    severity TEXT NOT NULL, status TEXT NOT NULL, n INTEGER NOT NULL CHECK (n > 0),
    PRIMARY KEY (projectId, submittalId, class, severity, status)) WITHOUT ROWID`,
  `INSERT INTO discrepancy_tallies SELECT projectId, submittalId, class, severity, status, COUNT(*)
     FROM discrepancies GROUP BY 1, 2, 3, 4, 5`,
  `CREATE TRIGGER discrepancies_tally_insert AFTER INSERT ON discrepancies BEGIN
     INSERT INTO discrepancy_tallies VALUES (NEW.projectId, NEW.submittalId, NEW.class, NEW.severity, NEW.status, 1)
       ON CONFLICT (projectId, submittalId, class, severity, status) DO UPDATE SET n = n + 1;
   END`,
  `CREATE TRIGGER discrepancies_tally_delete AFTER DELETE ON discrepancies BEGIN
     DELETE FROM discrepancy_tallies WHERE projectId = OLD.projectId AND submittalId = OLD.submittalId
       AND class = OLD.class AND severity = OLD.severity AND status = OLD.status AND n = 1;
     UPDATE discrepancy_tallies SET n = n - 1 WHERE projectId = OLD.projectId AND submittalId = OLD.submittalId
       AND class = OLD.class AND severity = OLD.severity AND status = OLD.status;
   END`,
  `CREATE TRIGGER discrepancies_tally_update AFTER UPDATE OF projectId, submittalId, class, severity, status
   ON discrepancies WHEN OLD.projectId IS NOT NEW.projectId OR OLD.submittalId IS NOT NEW.submittalId
     OR OLD.class IS NOT NEW.class OR OLD.severity IS NOT NEW.severity OR OLD.status IS NOT NEW.status BEGIN
     DELETE FROM discrepancy_tallies WHERE projectId = OLD.projectId AND submittalId = OLD.submittalId
       AND class = OLD.class AND severity = OLD.severity AND status = OLD.status AND n = 1;
     UPDATE discrepancy_tallies SET n = n - 1 WHERE projectId = OLD.projectId AND submittalId = OLD.submittalId
       AND class = OLD.class AND severity = OLD.severity AND status = OLD.status;
     INSERT INTO discrepancy_tallies VALUES (NEW.projectId, NEW.submittalId, NEW.class, NEW.severity, NEW.status, 1)
       ON CONFLICT (projectId, submittalId, class, severity, status) DO UPDATE SET n = n + 1;
   END`,
];

export const revisionsAssignmentsNotifications = {
  name: '0005-revisions-assignments-notifications',
  async up({ context }: { context: Sequelize }): Promise<void> {
    await rebuild(context, up);
  },
  async down({ context }: { context: Sequelize }): Promise<void> {
    await rebuild(context, down);
  },
};
