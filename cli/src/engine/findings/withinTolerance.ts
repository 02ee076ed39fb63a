import type { Dimension } from './formatQuantity.js';
import type { Tolerance } from './types.js';

/** Default comparison tolerance: 0.5 % relative. */
export const DEFAULT_TOLERANCE: Tolerance = { relative: 0.005 };

/**
 * Whether a claimed value agrees with the recomputed one: |claimed − recomputed| ≤ the absolute
 * tolerance for the dimension when one is given, else ≤ relative · |recomputed|.
 *
 * @param claimed - the submitted value
 * @param recomputed - the engine's value
 * @param dimension - what the value measures (ratios and stresses always compare relatively)
 * @param tolerance - the tolerance (default 0.5 %)
 * @returns true when the two agree
 * @example
 * withinTolerance(5.75, 5.7708, 'area')                                        // → true (0.36 %)
 * withinTolerance(6.1, 5.7708, 'area')                                         // → false
 * withinTolerance(5.75, 5.7708, 'area', { relative: 0, absolute: { area: 0.01 } }) // → false
 */
export function withinTolerance(
  claimed: number,
  recomputed: number,
  dimension: Dimension,
  tolerance: Tolerance = DEFAULT_TOLERANCE,
): boolean {
  const absolute =
    dimension === 'ratio' || dimension === 'stress' ? undefined : tolerance.absolute?.[dimension];
  const allowed = absolute ?? tolerance.relative * Math.abs(recomputed);
  return Math.abs(claimed - recomputed) <= allowed + 1e-12 * Math.max(1, Math.abs(recomputed));
}
