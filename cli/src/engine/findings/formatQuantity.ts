import type { UnitSystem } from '../types.js';
import { unitSymbol } from './unitSymbol.js';

/** Physical dimension of a value a user reads: a compared claim, a table cell, a message. */
export type Dimension = 'length' | 'area' | 'force' | 'stress' | 'ratio';

/**
 * Decimals per unit system: the precision every report, message, table and export of a file is
 * written in (results keep full precision). Inch lengths and areas to 0.001, so a 1/16 in step
 * and a 0.5 % difference both show; millimetres to 0.1 mm and whole mm²; forces to 0.1 kip or kN;
 * stresses to 0.1 ksi or whole MPa; ratios (U, β) to 0.001.
 */
const DECIMALS: Record<UnitSystem, Record<Dimension, number>> = {
  in: { length: 3, area: 3, force: 1, stress: 1, ratio: 3 },
  mm: { length: 1, area: 0, force: 1, stress: 0, ratio: 3 },
};

export interface FormatQuantityOptions {
  /** Append the unit (default true); false for a table column whose heading names the unit. */
  readonly unit?: boolean;
}

/**
 * A value with its unit, rounded to the file's precision: the one number formatter of the CLI
 * reports, the engine's messages, the service's report and exports, and the web app.
 *
 * @param value - the number, in the file's unit system
 * @param dimension - what it measures
 * @param units - the file's unit system
 * @param options - `unit: false` for the number alone
 * @returns e.g. `5.771 in²`, `5700 mm²`, `226.8 kip`, `0.850`; `—` for a value that is not finite
 * @example
 * formatQuantity(5.7708, 'area', 'in') // → '5.771 in²'
 * formatQuantity(1923.75, 'force', 'mm') // → '1923.8 kN'
 * formatQuantity(0.875, 'length', 'in', { unit: false }) // → '0.875'
 */
export function formatQuantity(
  value: number,
  dimension: Dimension,
  units: UnitSystem,
  options: FormatQuantityOptions = {},
): string {
  if (!Number.isFinite(value)) return '—';
  const fixed = value.toFixed(DECIMALS[units][dimension]);
  // A value that rounds to zero is written without a minus sign.
  const text = Number(fixed) === 0 ? fixed.replace(/^-/, '') : fixed;
  const unit = unitSymbol(dimension, units);
  return options.unit === false || unit === '' ? text : `${text} ${unit}`;
}
