import { ProfileError } from './profileError.js';
import type { ProfileTensionInput, ProfileTensionResult } from './types.js';

/** Resistance factors of CSA S16; φ = 0.90, φu = 0.75 (published in R3's course notes). */
export interface CsaS16Factors {
  readonly phi?: number;
  readonly phiU?: number;
}

/**
 * Factored tensile resistance, CSA S16 13.2: Tr = φ Ag Fy (gross yielding) and Tr = φu Ane Fu (net
 * rupture; Ane = An when no shear lag reduction applies), the lesser governing.
 *
 * @param input - Ag, An, optional Ae (Ane), Fy, Fu
 * @param factors - φ, φu overrides
 * @returns both resistances and the governing one, kN
 * @example
 * // N. Holtz, Carleton CSA S16 notes, Example T10 (R3): 300 × 25 plate, 350W, An 5700 mm²
 * csaS16TensionResistance({ Ag: 7500, An: 5700, Fy: 350, Fu: 450 }).yielding.available // → 2362.5
 * csaS16TensionResistance({ Ag: 7500, An: 5700, Fy: 350, Fu: 450 }).rupture.available  // → 1923.75
 */
export function csaS16TensionResistance(
  input: ProfileTensionInput,
  factors: CsaS16Factors = {},
): ProfileTensionResult {
  const phi = factors.phi ?? 0.9;
  const phiU = factors.phiU ?? 0.75;
  if (!(phi > 0 && phiU > 0 && input.Fy > 0 && input.Fu > 0 && input.Ag > 0 && input.An > 0)) {
    throw new ProfileError('Ag, An, Fy, Fu, φ and φu must be positive');
  }
  const gross = (input.Ag * input.Fy) / 1000;
  const net = ((input.Ae ?? input.An) * input.Fu) / 1000;
  const yielding = {
    limitState: 'yielding',
    nominal: gross,
    factor: phi,
    available: phi * gross,
    clause: 'CSA S16 13.2(a)(i)',
  } as const;
  const rupture = {
    limitState: 'rupture',
    nominal: net,
    factor: phiU,
    available: phiU * net,
    clause: 'CSA S16 13.2(a)(iii)',
  } as const;
  return { yielding, rupture, governing: rupture.available < yielding.available ? rupture : yielding };
}
