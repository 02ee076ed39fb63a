import { BlockShearError } from './blockShearError.js';
import type { BlockShearAreas, BlockShearStrength } from './types.js';

/** Input of {@link blockShearEn}. */
export interface BlockShearEnInput {
  /** Yield strength fy, MPa. */
  readonly fy: number;
  /** Ultimate tensile strength fu, MPa. */
  readonly fu: number;
  /** `concentric`: a symmetric bolt group under concentric load (3.10.2(2)); `eccentric`: 3.10.2(3). */
  readonly loading: 'concentric' | 'eccentric';
  /** Partial factors; recommended γM0 = 1.00, γM2 = 1.25 (a National Annex may differ). */
  readonly gammaM0?: number;
  readonly gammaM2?: number;
}

/**
 * Block tearing resistance, EN 1993-1-8 3.10.2 (SI, kN): concentric Veff,1,Rd = fu Ant/γM2 +
 * (1/√3) fy Anv/γM0; eccentric Veff,2,Rd = 0.5 fu Ant/γM2 + (1/√3) fy Anv/γM0. Note that EN takes the
 * NET shear area with fy; Agv and Agt are not used.
 *
 * @param areas - Anv and Ant, mm²
 * @param input - fy, fu, loading, γM0, γM2
 * @returns resistance in kN (nominal = available: the partial factors are inside the formula)
 * @example
 * // S275 (fy 275, fu 430), Ant 1000 mm², Anv 2000 mm², concentric
 * blockShearEn({ Agv: 0, Anv: 2000, Agt: 0, Ant: 1000 }, { fy: 275, fu: 430, loading: 'concentric' }).available
 * // → 661.54 (430·1000/1.25 + 275·2000/(√3·1.00), in kN)
 */
export function blockShearEn(areas: BlockShearAreas, input: BlockShearEnInput): BlockShearStrength {
  const gM0 = input.gammaM0 ?? 1.0;
  const gM2 = input.gammaM2 ?? 1.25;
  if (!(input.fy > 0 && input.fu > 0 && gM0 > 0 && gM2 > 0)) {
    throw new BlockShearError('fy, fu, γM0 and γM2 must be positive');
  }
  const k = input.loading === 'concentric' ? 1 : 0.5;
  const value = ((k * input.fu * areas.Ant) / gM2 + (input.fy * areas.Anv) / (Math.sqrt(3) * gM0)) / 1000;
  return {
    nominal: value,
    factor: gM2,
    available: value,
    governs: input.loading === 'concentric' ? 'Veff,1,Rd (concentric)' : 'Veff,2,Rd (eccentric)',
    clause: input.loading === 'concentric' ? 'EN 1993-1-8 3.10.2(2)' : 'EN 1993-1-8 3.10.2(3)',
    tensionFactor: k,
  };
}
