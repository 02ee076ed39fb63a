import { en1993Detailing } from './en1993Detailing.js';
import { en1993HoleWidth } from './en1993HoleWidth.js';
import { en1993TensionResistance, type En1993Factors } from './en1993TensionResistance.js';
import type { TensionProfile } from './types.js';

/**
 * The EN 1993-1-1 profile (SI) in the common profile shape, with the partial factors given (defaults:
 * the recommended γM0 = 1.00, γM2 = 1.25; pass a National Annex's values to override).
 *
 * @param factors - γM0 and γM2
 * @returns the profile: hole width d0 without allowance, least-chain net area (6.2.2.2), Npl,Rd and
 *   Nu,Rd (6.2.3), EN 1993-1-8 Table 3.3 detailing
 * @example
 * en1993Profile().holeWidth({ boltDiameter: 24 }).deducted          // → 26
 * en1993Profile({ gammaM2: 1.1 }).factors.gammaM2                   // → 1.1
 */
export function en1993Profile(factors: En1993Factors = {}): TensionProfile {
  const gammaM0 = factors.gammaM0 ?? 1.0;
  const gammaM2 = factors.gammaM2 ?? 1.25;
  return {
    standard: 'EN 1993-1-1',
    units: 'mm',
    factors: { gammaM0, gammaM2 },
    netAreaRule: {
      rule: 'least-chain',
      allowance: 0,
      clause: 'EN 1993-1-1 6.2.2.2',
      description:
        'gross area less the larger of the straight deduction t·Σd0 and the staggered deduction t(n·d0 − Σs²/4p): the least chain',
    },
    holeWidth: en1993HoleWidth,
    tensionResistance: (input) => en1993TensionResistance(input, { gammaM0, gammaM2 }),
    detailing: en1993Detailing,
  };
}

/** EN 1993-1-1 with the recommended partial factors. */
export const EN_1993_1_1: TensionProfile = en1993Profile();
