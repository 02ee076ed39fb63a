import type { Sequelize } from 'sequelize';

/**
 * Two things the discrepancy list reads on every request, kept so it never walks every row of a
 * project:
 * - `discrepancy_tallies`: how many discrepancies each (project, submittal, class, severity, status)
 *   holds. Triggers keep it exact inside the very statement that inserts, moves or deletes a
 *   discrepancy, so a count read from it is always the count of the rows (writers outside the
 *   service included). The list's total is a sum over a handful of tally rows.
 * - the severity-rank index of 0002 with `status` appended, so a page filtered by status is read in
 *   order from the index alone and only the page's own rows are fetched.
 */
const KEY = ['projectId', 'submittalId', 'class', 'severity', 'status'] as const;
const matches = (row: 'OLD' | 'NEW') => KEY.map((c) => `${c} = ${row}.${c}`).join(' AND ');
const values = (row: 'OLD' | 'NEW') => KEY.map((c) => `${row}.${c}`).join(', ');
const add = (row: 'NEW') =>
  `INSERT INTO discrepancy_tallies (${KEY.join(', ')}, n) VALUES (${values(row)}, 1)
     ON CONFLICT (${KEY.join(', ')}) DO UPDATE SET n = n + 1;`;
const remove = (row: 'OLD') =>
  `DELETE FROM discrepancy_tallies WHERE ${matches(row)} AND n = 1;
   UPDATE discrepancy_tallies SET n = n - 1 WHERE ${matches(row)};`;

const up = [
  `CREATE TABLE discrepancy_tallies (
    projectId INTEGER NOT NULL,
    submittalId INTEGER NOT NULL,
    class TEXT NOT NULL,
    severity TEXT NOT NULL,
    status TEXT NOT NULL,
    n INTEGER NOT NULL CHECK (n > 0),
    PRIMARY KEY (${KEY.join(', ')})) WITHOUT ROWID`,
  `INSERT INTO discrepancy_tallies (${KEY.join(', ')}, n)
     SELECT ${KEY.join(', ')}, COUNT(*) FROM discrepancies GROUP BY ${KEY.join(', ')}`,
  `CREATE TRIGGER discrepancies_tally_insert AFTER INSERT ON discrepancies BEGIN
     ${add('NEW')}
   END`,
  `CREATE TRIGGER discrepancies_tally_delete AFTER DELETE ON discrepancies BEGIN
     ${remove('OLD')}
   END`,
  `CREATE TRIGGER discrepancies_tally_update AFTER UPDATE OF ${KEY.join(', ')} ON discrepancies
   WHEN ${KEY.map((c) => `OLD.${c} IS NOT NEW.${c}`).join(' OR ')} BEGIN
     ${remove('OLD')}
     ${add('NEW')}
   END`,
  `CREATE INDEX discrepancies_project_severity_status ON discrepancies
    (projectId, (CASE severity WHEN 'error' THEN 0 WHEN 'warning' THEN 1 ELSE 2 END), id, status)`,
  'DROP INDEX discrepancies_project_severity',
];

const down = [
  `CREATE INDEX discrepancies_project_severity ON discrepancies
    (projectId, (CASE severity WHEN 'error' THEN 0 WHEN 'warning' THEN 1 ELSE 2 END), id)`,
  'DROP INDEX discrepancies_project_severity_status',
  'DROP TRIGGER discrepancies_tally_update',
  'DROP TRIGGER discrepancies_tally_delete',
  'DROP TRIGGER discrepancies_tally_insert',
  'DROP TABLE discrepancy_tallies',
];

export const discrepancyTallies = {
  name: '0003-discrepancy-tallies',
  // One transaction each way: a failure leaves neither half a tally table nor triggers without it.
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
