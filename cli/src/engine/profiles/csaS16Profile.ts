import { csaS16Detailing } from './csaS16Detailing.js';
import { csaS16HoleWidth } from './csaS16HoleWidth.js';
import { csaS16TensionResistance, type CsaS16Factors } from './csaS16TensionResistance.js';
import type { TensionProfile } from './types.js';

/**
 * The CSA S16-19 profile (SI) in the common profile shape. Only what could be sourced: hole + 2 mm,
 * least-chain net area (12.3.1), Tr = φ Ag Fy and φu Ane Fu, pitch ≥ 2.7d. Edge distances are not
 * checked (not sourced).
 *
 * @param factors - φ and φu (defaults 0.90 and 0.75)
 * @returns the profile
 * @example
 * csaS16Profile().holeWidth({ holeDiameter: 22 }).deducted // → 24
 */
export function csaS16Profile(factors: CsaS16Factors = {}): TensionProfile {
  const phi = factors.phi ?? 0.9;
  const phiU = factors.phiU ?? 0.75;
  return {
    standard: 'CSA S16-19',
    units: 'mm',
    factors: { phi, phiU },
    netAreaRule: {
      rule: 'least-chain',
      allowance: 2,
      clause: 'CSA S16 12.3.1, 12.3.2',
      description:
        'sum over the failure path of wn·t, plus s²t/4g for each inclined segment; holes 2 mm larger than specified',
    },
    holeWidth: csaS16HoleWidth,
    tensionResistance: (input) => csaS16TensionResistance(input, { phi, phiU }),
    detailing: csaS16Detailing,
  };
}

/** CSA S16-19 with its resistance factors. */
export const CSA_S16_19: TensionProfile = csaS16Profile();
