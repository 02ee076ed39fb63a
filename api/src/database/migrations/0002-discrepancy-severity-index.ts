import type { Sequelize } from 'sequelize';

/**
 * The discrepancy list sorts by severity rank (error, warning, note) within a project. An index on
 * that very expression lets SQLite read a page in order instead of sorting every row of the project.
 * The expression must stay identical to SEVERITY_RANK in discrepancies.service.ts.
 */
export const discrepancySeverityIndex = {
  name: '0002-discrepancy-severity-index',
  async up({ context }: { context: Sequelize }): Promise<void> {
    await context.query(
      `CREATE INDEX discrepancies_project_severity ON discrepancies
        (projectId, (CASE severity WHEN 'error' THEN 0 WHEN 'warning' THEN 1 ELSE 2 END), id)`,
    );
  },
  async down({ context }: { context: Sequelize }): Promise<void> {
    await context.query('DROP INDEX IF EXISTS discrepancies_project_severity');
  },
};
