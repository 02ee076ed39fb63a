import type { Dimension } from './formatQuantity.js';
import type { UnitSystem } from '../types.js';

const SYMBOL: Record<UnitSystem, Record<Dimension, string>> = {
  in: { length: 'in', area: 'in²', force: 'kip', stress: 'ksi', ratio: '' },
  mm: { length: 'mm', area: 'mm²', force: 'kN', stress: 'MPa', ratio: '' },
};

/**
 * The unit a file's values of one dimension are in, for a table heading or a form label.
 *
 * @param dimension - what the values measure
 * @param units - the file's unit system
 * @returns `in`, `in²`, `kip`, `ksi`, `mm`, `mm²`, `kN`, `MPa`; `''` for a ratio
 * @example
 * unitSymbol('area', 'mm') // → 'mm²'
 */
export function unitSymbol(dimension: Dimension, units: UnitSystem): string {
  return SYMBOL[units][dimension];
}
