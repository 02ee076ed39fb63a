import type { CodeProfile, DesignMethod } from '../types.js';

/**
 * The design method a code profile is checked by, named as its code names it: AISC 360 offers
 * LRFD (φ) and ASD (Ω); EN 1993-1-1 verifies by the partial factor method (γM0, γM2; EN 1990
 * section 6); CSA S16 is limit states design with resistance factors (φ, φu; S16 clause 1). A calc
 * file written to format 1.0 before these names existed says "LRFD" for EN and CSA files; it reads
 * as the code's own method.
 *
 * @param profile - the calc file's standard and method as written
 * @returns `LRFD`, `ASD`, `partial-factor` or `LSD`
 * @example
 * designMethodOf({ standard: 'EN 1993-1-1', method: 'LRFD' }) // → 'partial-factor'
 * designMethodOf({ standard: 'CSA S16-19', method: 'LSD' }) // → 'LSD'
 * designMethodOf({ standard: 'AISC 360-16', method: 'ASD' }) // → 'ASD'
 */
export function designMethodOf(profile: Pick<CodeProfile, 'standard' | 'method'>): DesignMethod {
  if (profile.standard === 'EN 1993-1-1') return 'partial-factor';
  if (profile.standard === 'CSA S16-19') return 'LSD';
  return profile.method === 'ASD' ? 'ASD' : 'LRFD';
}
