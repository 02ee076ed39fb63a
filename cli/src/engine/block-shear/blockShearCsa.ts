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
  /** φu, default 0.75 (CSA S16, as in REFERENCES R3). */
  readonly phiU?: number;
}

/**
 * Block shear resistance, CSA S16 13.11 (SI, kN): Tr = φu [Ut An Fu + 0.6 Agv (Fy + Fu)/2], with Fy in
 * place of (Fy + Fu)/2 when Fy > 485 MPa. The form and the 485 MPa limit are as N. Holtz's CSA S16-09
 * course notebooks (Carleton University, CIVE 3205) code clause 13.11.
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
  const shearStress = input.Fy > 485 ? input.Fy : (input.Fy + input.Fu) / 2;
  const nominal = (input.Ut * areas.Ant * input.Fu + 0.6 * areas.Agv * shearStress) / 1000;
  return {
    nominal,
    factor: phiU,
    available: phiU * nominal,
    governs:
      input.Fy > 485 ? 'tension rupture with shear at Fy' : 'tension rupture with shear at (Fy + Fu)/2',
    clause: 'CSA S16 13.11',
  };
}
