import type { UnitSystem } from '../types.js';

/** Physical dimension of a compared value. */
export type Dimension = 'length' | 'area' | 'force' | 'ratio';

const UNIT: Record<UnitSystem, Record<Dimension, string>> = {
  in: { length: 'in', area: 'in²', force: 'kip', ratio: '' },
  mm: { length: 'mm', area: 'mm²', force: 'kN', ratio: '' },
};

const DECIMALS: Record<UnitSystem, Record<Dimension, number>> = {
  in: { length: 2, area: 2, force: 1, ratio: 3 },
  mm: { length: 1, area: 0, force: 1, ratio: 3 },
};

/**
 * A value with its unit, rounded the way engineers write it in that unit system (for messages only;
 * results keep full precision).
 *
 * @param value - the number
 * @param dimension - what it measures
 * @param units - the unit system
 * @returns e.g. `5.75 in²`, `5700 mm²`, `226.8 kip`, `0.850`
 * @example
 * formatQuantity(5.7708, 'area', 'in') // → '5.77 in²'
 * formatQuantity(1923.75, 'force', 'mm') // → '1923.8 kN'
 */
export function formatQuantity(value: number, dimension: Dimension, units: UnitSystem): string {
  const text = value.toFixed(DECIMALS[units][dimension]);
  const unit = UNIT[units][dimension];
  return unit ? `${text} ${unit}` : text;
}
