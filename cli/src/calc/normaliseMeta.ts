import type { Raw } from './normaliseTypes.js';
import type { CalcMeta } from './types.js';

/**
 * A calc file's `meta` as the rest of Ligament reads it: the optional fields only when given, and
 * `notes` written as an array of lines joined into one text.
 *
 * @param raw - the schema-valid `meta` object
 * @returns the meta
 * @example
 * normaliseMeta({ project: 'Harbour Lantern Footbridge', preparedBy: 'A. Engineer', date: '2026-11-20', notes: ['a', 'b'] }).notes
 * // → 'a\nb'
 */
export function normaliseMeta(raw: Raw): CalcMeta {
  const notes = raw['notes'];
  return {
    project: raw['project'] as string,
    preparedBy: raw['preparedBy'] as string,
    ...(raw['firm'] !== undefined ? { firm: raw['firm'] as string } : {}),
    date: raw['date'] as string,
    ...(raw['tool'] !== undefined ? { tool: raw['tool'] as CalcMeta['tool'] & object } : {}),
    ...(raw['reference'] !== undefined ? { reference: raw['reference'] as string } : {}),
    ...(notes !== undefined
      ? { notes: Array.isArray(notes) ? (notes as string[]).join('\n') : (notes as string) }
      : {}),
  };
}
