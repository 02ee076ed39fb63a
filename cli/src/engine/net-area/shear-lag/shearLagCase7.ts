/** Input of {@link shearLagCase7}. */
export interface ShearLagCase7Input {
  readonly connected: 'flange' | 'web';
  readonly fastenersPerLine: number;
  /** Flange width (flange connection only). */
  readonly bf?: number;
  /** Depth (flange connection only). */
  readonly d?: number;
}

/**
 * AISC 360 Table D3.1 case 7, W, M, S or HP shapes or tees cut from them: flange connected with 3 or
 * more fasteners per line in the direction of loading, U = 0.90 when bf ≥ 2/3 d, else 0.85; web
 * connected with 4 or more fasteners per line, U = 0.70. Fewer fasteners: the case does not apply.
 *
 * @param input - connected element, fasteners per line, bf and d for a flange connection
 * @returns U, or null when the case does not apply
 * @example
 * shearLagCase7({ connected: 'flange', fastenersPerLine: 3, bf: 7.07, d: 8.13 }) // → 0.9 (WT8x25, R6)
 * shearLagCase7({ connected: 'web', fastenersPerLine: 3 })                       // → null
 */
export function shearLagCase7(input: ShearLagCase7Input): number | null {
  if (input.connected === 'web') return input.fastenersPerLine >= 4 ? 0.7 : null;
  if (input.fastenersPerLine < 3 || input.bf === undefined || input.d === undefined) return null;
  return input.bf >= (2 / 3) * input.d ? 0.9 : 0.85;
}
