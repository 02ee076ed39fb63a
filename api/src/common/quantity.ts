import { formatQuantity, type Dimension, type UnitSystem } from 'ligament';

/**
 * A stored number with its unit at its file's precision (engine formatQuantity), `—` when there is
 * none. Migration 0007 gives every discrepancy with numbers its units and quantity; a value without
 * them is written as a bare number to 0.001.
 *
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
