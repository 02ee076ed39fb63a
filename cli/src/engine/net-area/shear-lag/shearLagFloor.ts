import { ShearLagError } from './shearLagError.js';

/**
 * The least U an open section need take (AISC 360-16 and 360-22 D3): "for open cross sections such
 * as W, M, S, C or HP shapes, WTs, STs, and single and double angles, the shear lag factor, U, need not
 * be less than the ratio of the gross area of the connected element(s) to the member gross area".
 * The ratio is at most 1 (every element connected). AISC 360-10 has no such floor (from memory).
 *
 * @param connectedArea - gross area of the connected element(s), > 0
 * @param grossArea - gross area of the member, > 0
 * @returns min(1, connectedArea / grossArea)
 * @throws ShearLagError when either area is not positive
 * @example
 * shearLagFloor(2 * 8.06 * 0.66, 24.0) // → 0.44330 (W14x82: both flanges of 8.06 × 0.66 over Ag 24.0)
 * shearLagFloor(4 * 0.5, 3.75)        // → 0.53333 (L4x4x1/2 connected by one 4 in leg)
 */
export function shearLagFloor(connectedArea: number, grossArea: number): number {
  if (!(Number.isFinite(connectedArea) && connectedArea > 0)) {
    throw new ShearLagError(`the connected elements' gross area must be positive, got ${connectedArea}`);
  }
  if (!(Number.isFinite(grossArea) && grossArea > 0)) {
    throw new ShearLagError(`the member's gross area must be positive, got ${grossArea}`);
  }
  return Math.min(1, connectedArea / grossArea);
}
