import { formatQuantity, type Dimension } from './formatQuantity.js';
import type { UnitSystem } from '../types.js';

/**
 * A stored value with its unit at its file's precision ({@link formatQuantity}), for the views that
 * read values back with their quantity and unit system (discrepancies, recheck changes): `—` when
 * there is no value; a value stored without them is written as a bare number to 0.001.
 *
 * @param value - the stored value, or null
 * @param quantity - what it measures, or null
 * @param units - its file's unit system, or null
 * @returns e.g. `6.100 in²`, `3232 mm²`, `—`
 * @example
 * quantityText(6.1, 'area', 'in') // → '6.100 in²'
 * quantityText(null, 'area', 'mm') // → '—'
 */
export function quantityText(
  value: number | null | undefined,
  quantity: Dimension | null | undefined,
  units: UnitSystem | null | undefined,
): string {
  if (value === null || value === undefined) return '—';
  if (!quantity || !units) return formatQuantity(value, 'ratio', 'in');
  return formatQuantity(value, quantity, units);
}
