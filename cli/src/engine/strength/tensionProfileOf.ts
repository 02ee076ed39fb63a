import { csaS16Profile } from '../profiles/csaS16Profile.js';
import { en1993Profile } from '../profiles/en1993Profile.js';
import type { TensionProfile } from '../profiles/types.js';
import type { CodeProfile } from '../types.js';

/**
 * The EN 1993-1-1 or CSA S16-19 profile a calc file's code selects, with its National Annex factors;
 * null for AISC 360, whose rules live in the core (holeWidth, analyseMember).
 *
 * @param profile - the calc file's code profile
 * @returns the tension profile, or null for AISC 360
 * @example
 * tensionProfileOf({ standard: 'EN 1993-1-1', method: 'LRFD', units: 'mm', nationalAnnex: { gammaM2: 1.1 } })?.factors
 * // → { gammaM0: 1, gammaM2: 1.1 }
 */
export function tensionProfileOf(profile: CodeProfile): TensionProfile | null {
  switch (profile.standard) {
    case 'EN 1993-1-1':
      return en1993Profile({
        ...(profile.nationalAnnex?.gammaM0 !== undefined ? { gammaM0: profile.nationalAnnex.gammaM0 } : {}),
        ...(profile.nationalAnnex?.gammaM2 !== undefined ? { gammaM2: profile.nationalAnnex.gammaM2 } : {}),
      });
    case 'CSA S16-19':
      return csaS16Profile();
    default:
      return null;
  }
}
