/** How dimensions read on the sketch: inches as fractions to 1/16, millimetres as whole numbers. */
import { formatQuantity } from '../engine/findings/formatQuantity.js';
import type { UnitSystem } from '../engine/types.js';

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

/**
 * A length as a drawing label.
 *
 * @example
 * lengthLabel(2.5, 'in') // → '2 1/2'
 * lengthLabel(0.8125, 'in') // → '13/16'
 * lengthLabel(3.1, 'in') // → '3.100'
 * lengthLabel(75, 'mm') // → '75'
 */
export function lengthLabel(value: number, units: UnitSystem): string {
  if (units === 'mm') {
    const r = Math.round(value * 10) / 10;
    return Number.isInteger(r) ? String(r) : r.toFixed(1);
  }
  const sixteenths = Math.round(value * 16);
  if (Math.abs(value * 16 - sixteenths) > 1e-6) return value.toFixed(3);
  const whole = Math.trunc(sixteenths / 16);
  const rest = Math.abs(sixteenths % 16);
  if (rest === 0) return String(whole);
  const d = gcd(rest, 16);
  const frac = `${rest / d}/${16 / d}`;
  return whole === 0 ? (sixteenths < 0 ? `-${frac}` : frac) : `${whole} ${frac}`;
}

/** Net width with unit at the file's precision (engine formatQuantity), e.g. `11.542 in` or `281.0 mm`. */
export function netWidthLabel(value: number, units: UnitSystem): string {
  return formatQuantity(value, 'length', units);
}
