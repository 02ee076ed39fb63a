import { designMethodOf } from './designMethodOf.js';
import { tensionProfileOf } from './tensionProfileOf.js';
import type { CodeProfile } from '../types.js';

/**
 * The code and design method as reports, drawings and the web name them, each code in its own
 * terms: AISC 360 LRFD or ASD; EN 1993-1-1 with its partial factors (recommended, or a National
 * Annex's); CSA S16 limit states design with its resistance factors. Never "LRFD" for EN or CSA.
 *
 * @param profile - the calc file's code profile
 * @returns e.g. `AISC 360-22 LRFD`, `EN 1993-1-1, partial factors γM0 1.00, γM2 1.25`,
 *   `CSA S16-19, limit states design φ 0.90, φu 0.75`
 * @example
 * codeLabel({ standard: 'EN 1993-1-1', method: 'LRFD', units: 'mm', nationalAnnex: { gammaM2: 1.1 } })
 * // → 'EN 1993-1-1, partial factors γM0 1.00, γM2 1.10'
 */
export function codeLabel(profile: CodeProfile): string {
  const method = designMethodOf(profile);
  const factors = tensionProfileOf(profile)?.factors ?? {};
  const f = (name: string) => (factors[name] ?? Number.NaN).toFixed(2);
  if (method === 'partial-factor') {
    return `${profile.standard}, partial factors γM0 ${f('gammaM0')}, γM2 ${f('gammaM2')}`;
  }
  if (method === 'LSD') return `${profile.standard}, limit states design φ ${f('phi')}, φu ${f('phiU')}`;
  return `${profile.standard} ${method}`;
}
