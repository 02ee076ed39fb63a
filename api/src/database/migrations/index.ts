import { initialSchema } from './0001-initial-schema.js';
import { discrepancySeverityIndex } from './0002-discrepancy-severity-index.js';

/** Every migration, in order. Add new ones at the end; never edit one that has shipped. */
export const migrations = [initialSchema, discrepancySeverityIndex];
