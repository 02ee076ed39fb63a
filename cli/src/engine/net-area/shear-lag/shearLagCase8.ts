/**
 * AISC 360 Table D3.1 case 8, single and double angles: 4 or more fasteners per line in the direction
 * of loading, U = 0.80; 3 fasteners per line, U = 0.60. Fewer: the case does not apply (use case 2).
 *
 * @param fastenersPerLine - fasteners per line in the direction of loading
 * @returns U, or null when the case does not apply
 * @example
 * shearLagCase8(9) // → 0.8 (2L6x6x5/8 with 9 bolts, R6; case 2's 0.928 governs)
 * shearLagCase8(3) // → 0.6
 */
export function shearLagCase8(fastenersPerLine: number): number | null {
  if (fastenersPerLine >= 4) return 0.8;
  if (fastenersPerLine === 3) return 0.6;
  return null;
}
