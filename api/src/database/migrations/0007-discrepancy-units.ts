import type { Sequelize } from 'sequelize';

/**
 * Each discrepancy carries what its claimed and recomputed numbers measure and in which unit system,
 * so every view writes them with their unit at the file's precision (issue 10.10):
 * - `units`: the calc file's unit system (`in` or `mm`), backfilled from the stored document;
 * - `quantity`: `length`, `area`, `force` or `ratio` (engine findingQuantity), backfilled from the
 *   finding code with the table below, frozen as the catalogue was when this shipped.
 */
const QUANTITY_OF_CODE: Readonly<Record<string, string>> = {
  LG101: 'area',
  LG102: 'area',
  LG103: 'force',
  LG104: 'ratio',
  LG105: 'area',
  LG106: 'force',
  LG107: 'area',
  LG111: 'area',
  LG112: 'area',
  LG113: 'force',
  LG114: 'ratio',
  LG115: 'area',
  LG116: 'force',
  LG117: 'area',
  LG121: 'area',
  LG122: 'length',
  LG124: 'length',
  LG125: 'length',
  LG131: 'area',
  LG132: 'force',
  LG141: 'area',
  LG142: 'ratio',
  LG201: 'length',
  LG202: 'length',
  LG203: 'length',
  LG204: 'length',
  LG205: 'length',
  LG206: 'length',
};

const cases = Object.entries(QUANTITY_OF_CODE)
  .map(([code, quantity]) => `WHEN '${code}' THEN '${quantity}'`)
  .join(' ');

/** Fills both columns of the rows stored before them (exported for the test of the backfill). */
export const DISCREPANCY_UNITS_BACKFILL = [
  `UPDATE discrepancies SET units = (
     SELECT json_extract(c.document, '$.profile.units') FROM calc_files c WHERE c.id = discrepancies.calcFileId)`,
  `UPDATE discrepancies SET quantity = CASE code ${cases} END
     WHERE claimed IS NOT NULL OR recomputed IS NOT NULL`,
];

const up = [
  `ALTER TABLE discrepancies ADD COLUMN units TEXT CHECK (units IN ('in','mm'))`,
  `ALTER TABLE discrepancies ADD COLUMN quantity TEXT CHECK (quantity IN ('length','area','force','stress','ratio'))`,
  ...DISCREPANCY_UNITS_BACKFILL,
];
const down = [
  'ALTER TABLE discrepancies DROP COLUMN quantity',
  'ALTER TABLE discrepancies DROP COLUMN units',
];

export const discrepancyUnits = {
  name: '0007-discrepancy-units',
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
