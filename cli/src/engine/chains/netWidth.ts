/**
 * Net width of a chain (AISC 360 B4.3b): wn = Wg − Σ(deducted hole widths) + Σ s²/(4g).
 *
 * @param grossWidth - gross width across the load
 * @param deducted - the deducted width of each hole in the chain (one entry per hole)
 * @param staggerTerms - s²/(4g) of each gauge space of the chain (one entry per leg)
 * @returns the net width, in the unit of the inputs
 * @example
 * // AISC Design Examples v13.0 D.9, zigzag through four holes: 14 − 4(0.875) + 2(2.5²/12)
 * netWidth(14, [0.875, 0.875, 0.875, 0.875], [0.5208333, 0, 0.5208333]) // → 11.5417
 * netWidth(12, [0.875, 0.875, 0.875, 0.875], [0.75, 0, 0.75])           // → 10 (Quimby, Example 1)
 */
export function netWidth(
  grossWidth: number,
  deducted: readonly number[],
  staggerTerms: readonly number[],
): number {
  let sum = grossWidth;
  for (const w of deducted) sum -= w;
  for (const t of staggerTerms) sum += t;
  return sum;
}
