import type { Dimension } from './formatQuantity.js';

/**
 * What the `claimed` and `recomputed` numbers of each finding code measure (the code's fields in
 * auditMember, the detailing checks and the loader): areas for the area claims, the missed chain
 * (its An against the claimed An), the equal-share check and the tabulated Ag; forces for the
 * strength claims and block shear; lengths for chain net widths and detailing distances; ratios
 * for U. Codes without numbers (LG123, LG3xx) have none.
 */
const QUANTITY: Readonly<Record<string, Dimension>> = {
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

/**
 * The dimension of a finding's claimed and recomputed values, so that a report, list or export can
 * write them with their unit (formatQuantity).
 *
 * @param code - a finding code of FINDING_CATALOGUE
 * @returns its dimension, or null for a code that carries no numbers
 * @example
 * findingQuantity('LG101') // → 'area'
 * findingQuantity('LG124') // → 'length'
 * findingQuantity('LG303') // → null
 */
export function findingQuantity(code: string): Dimension | null {
  return QUANTITY[code] ?? null;
}
