import { ShearLagError } from './shearLagError.js';

/**
 * AISC 360 Table D3.1 case 2: U = 1 − x̄/l, for tension members where the load is carried by some but
 * not all of the cross-sectional elements by fasteners.
 *
 * @param eccentricity - connection eccentricity x̄ (or ȳ), ≥ 0
 * @param length - connection length l, > 0
 * @returns U, in (0, 1]
 * @throws ShearLagError when l is not positive or x̄ is negative or not less than l
 * @example
 * shearLagCase2(1.02, 12)  // → 0.915  (W12x72, ȳ of the WT6x36; AISC teaching calc to 360-16)
 * shearLagCase2(1.72, 24)  // → 0.92833 (2L6x6x5/8; same source: 0.928)
 */
export function shearLagCase2(eccentricity: number, length: number): number {
  if (!(Number.isFinite(length) && length > 0)) {
    throw new ShearLagError(`connection length must be positive, got ${length}`);
  }
  if (!(Number.isFinite(eccentricity) && eccentricity >= 0 && eccentricity < length)) {
    throw new ShearLagError(
      `eccentricity must be ≥ 0 and less than the connection length ${length}, got ${eccentricity}`,
    );
  }
  return 1 - eccentricity / length;
}
