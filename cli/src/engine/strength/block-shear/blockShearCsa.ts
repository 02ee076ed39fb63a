import { BlockShearError } from './blockShearError.js';
import type { BlockShearAreas, BlockShearStrength } from './types.js';

/** Input of {@link blockShearCsa}. */
export interface BlockShearCsaInput {
  /** Specified minimum yield stress, MPa. */
  readonly Fy: number;
  /** Specified minimum tensile strength, MPa. */
  readonly Fu: number;
  /**
   * Efficiency factor on the tension area. From memory of CSA S16 13.11 (confirm against the
   * standard): 1.0 for symmetric blocks and gussets, 0.6 for angles connected by one leg and tee stems,
   * 0.3 for coped beams with two lines of bolts. The caller must give it.
   */
  readonly Ut: number;
  /** φu, default 0.75 (CSA S16, as in conformance/SOURCES.md R3). */
  readonly phiU?: number;
  /**
   * Edition of CSA S16, for the yield stress above which Fy replaces (Fy + Fu)/2 in the shear term:
   * 485 MPa in S16-09 (as coded in N. Holtz's CIVE 3205 notebooks, published); 460 MPa in S16-14 and
   * S16-19 (from memory; the same 460 MPa as a public equation package codes S16:24). Default S16-19.
   */
  readonly edition?: 'S16-09' | 'S16-14' | 'S16-19';
}

/** Yield stress above which Fy replaces (Fy + Fu)/2, MPa, by edition (see {@link BlockShearCsaInput}). */
export const CSA_SHEAR_STRESS_LIMIT = { 'S16-09': 485, 'S16-14': 460, 'S16-19': 460 } as const;

/**
 * Block shear resistance, CSA S16 13.11 (SI, kN): Tr = φu [Ut An Fu + 0.6 Agv (Fy + Fu)/2], with Fy in
 * place of (Fy + Fu)/2 above a yield stress that depends on the edition: 485 MPa in S16-09 (as
 * N. Holtz's CSA S16-09 course notebooks, Carleton University, CIVE 3205, code clause 13.11), 460 MPa
 * in S16-14 and S16-19 (from memory).
 *
 * @param areas - Ant (the tension net area An of the clause) and Agv, mm²
 * @param input - Fy, Fu, Ut, φu
 * @returns factored resistance Tr in kN; nominal = Tr/φu
 * @example
 * // 350W (Fy 350, Fu 450), An 1000 mm², Agv 3000 mm², Ut 1.0
 * blockShearCsa({ Agv: 3000, Anv: 0, Agt: 0, Ant: 1000 }, { Fy: 350, Fu: 450, Ut: 1 }).available
 * // → 877.5 (0.75 (1.0·1000·450 + 0.6·3000·400) / 1000)
 */
export function blockShearCsa(areas: BlockShearAreas, input: BlockShearCsaInput): BlockShearStrength {
  const phiU = input.phiU ?? 0.75;
  if (!(input.Fy > 0 && input.Fu > 0 && input.Ut > 0 && input.Ut <= 1 && phiU > 0)) {
    throw new BlockShearError('Fy, Fu and φu must be positive and Ut in (0, 1]');
  }
  const limit = CSA_SHEAR_STRESS_LIMIT[input.edition ?? 'S16-19'];
  const shearStress = input.Fy > limit ? input.Fy : (input.Fy + input.Fu) / 2;
  const nominal = (input.Ut * areas.Ant * input.Fu + 0.6 * areas.Agv * shearStress) / 1000;
  return {
    nominal,
    factor: phiU,
    available: phiU * nominal,
    governs:
      input.Fy > limit
        ? `tension rupture with shear at Fy (Fy > ${limit} MPa)`
        : 'tension rupture with shear at (Fy + Fu)/2',
    clause: `CSA ${input.edition ?? 'S16-19'} 13.11`,
    tensionFactor: input.Ut,
  };
}
