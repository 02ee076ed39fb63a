import { BlockShearError } from './blockShearError.js';
import type { BlockShearAreas, BlockShearStrength } from './types.js';

/** Input of {@link blockShearAisc}. */
export interface BlockShearAiscInput {
  readonly Fy: number;
  readonly Fu: number;
  /** 1.0 when the tension stress is uniform, 0.5 when it is not (AISC 360 J4.3). */
  readonly Ubs: number;
  readonly method: 'LRFD' | 'ASD';
  /** `mm` divides MPa·mm² by 1000 to give kN; `in` gives kip. */
  readonly units: 'in' | 'mm';
}

/**
 * Block shear strength, AISC 360 J4.3: Rn = 0.60 Fu Anv + Ubs Fu Ant ≤ 0.60 Fy Agv + Ubs Fu Ant;
 * φ = 0.75 (LRFD), Ω = 2.00 (ASD).
 *
 * @param areas - Agv, Anv, Agt, Ant
 * @param input - Fy, Fu, Ubs, method, units
 * @returns nominal and available strength, which shear term governed
 * @example
 * // 2L6x6x5/8, A36 (AISC teaching calc to 360-16, R6): Agv 32.66, Anv 22.04, Ant 4.07 → φRn 706 kips
 * blockShearAisc({ Agv: 32.66, Anv: 22.04, Agt: 4.69, Ant: 4.07 }, { Fy: 36, Fu: 58, Ubs: 1, method: 'LRFD', units: 'in' }).available
 * // → 706.14 (0.75 (0.6·36·32.66 + 58·4.07))
 */
export function blockShearAisc(areas: BlockShearAreas, input: BlockShearAiscInput): BlockShearStrength {
  if (!(input.Fy > 0 && input.Fu > 0)) throw new BlockShearError('Fy and Fu must be positive');
  if (!(input.Ubs > 0 && input.Ubs <= 1))
    throw new BlockShearError(`Ubs must be in (0, 1], got ${input.Ubs}`);
  const scale = input.units === 'mm' ? 1e-3 : 1;
  const tension = input.Ubs * input.Fu * areas.Ant;
  const rupture = 0.6 * input.Fu * areas.Anv;
  const yielding = 0.6 * input.Fy * areas.Agv;
  const nominal = (Math.min(rupture, yielding) + tension) * scale;
  const factor = input.method === 'LRFD' ? 0.75 : 2.0;
  return {
    nominal,
    factor,
    available: input.method === 'LRFD' ? factor * nominal : nominal / factor,
    governs:
      yielding < rupture
        ? 'shear yielding (0.60 Fy Agv) with tension rupture'
        : 'shear rupture (0.60 Fu Anv) with tension rupture',
    clause: 'AISC 360 J4.3',
    tensionFactor: input.Ubs,
  };
}
