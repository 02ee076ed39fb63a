/**
 * How far a claimed value lies from the recomputed one, as the tail of a finding's message:
 * |claimed − recomputed| / |recomputed|, to 0.1 %. Empty when the recomputed value is 0.
 *
 * @param claimed - the submitted value
 * @param recomputed - the engine's value
 * @returns e.g. ` by 5.7 %`, or `` for a recomputed 0
 * @example
 * percentDifference(6.1, 5.7708) // → ' by 5.7 %'
 */
export function percentDifference(claimed: number, recomputed: number): string {
  if (recomputed === 0) return '';
  return ` by ${((Math.abs(claimed - recomputed) / Math.abs(recomputed)) * 100).toFixed(1)} %`;
}
