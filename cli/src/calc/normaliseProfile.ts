import { designMethodOf } from '../engine/strength/designMethodOf.js';
import type { CodeProfile, UnitSystem } from '../engine/types.js';
import type { Raw, SemanticIssue } from './normaliseTypes.js';

/**
 * A calc file's `code` as the engine's code profile: standard, design method, the file's units and
 * a National Annex's partial factors. Rules the schema cannot say: EN 1993-1-1 and CSA S16 files are
 * in SI (code-units), each code is read by its own method (code-method: partial-factor for EN,
 * LSD for CSA, LRFD or ASD for AISC; "LRFD" kept valid for EN and CSA files written before), and only EN 1993-1-1 takes a National
 * Annex (national-annex-standard).
 *
 * @param code - the schema-valid `code` object
 * @param units - the file's units
 * @param issues - where the problems go
 * @returns the profile
 * @example
 * normaliseProfile({ standard: 'EN 1993-1-1', method: 'partial-factor', nationalAnnex: { gammaM2: 1.1 } }, 'mm', [])
 * // → { standard: 'EN 1993-1-1', method: 'partial-factor', units: 'mm', nationalAnnex: { gammaM2: 1.1 } }
 */
export function normaliseProfile(code: Raw, units: UnitSystem, issues: SemanticIssue[]): CodeProfile {
  const profile: { -readonly [K in keyof CodeProfile]: CodeProfile[K] } = {
    standard: code['standard'] as CodeProfile['standard'],
    method: code['method'] as CodeProfile['method'],
    units,
  };
  const si = profile.standard === 'EN 1993-1-1' || profile.standard === 'CSA S16-19';
  if (si && units !== 'mm') {
    issues.push({
      pointer: '/code/standard',
      rule: 'code-units',
      message: `/code/standard: ${profile.standard} files are in SI; give "units": "mm" (rule code-units)`,
    });
  }
  // Each code's own method; a 1.0 file may still say "LRFD" for EN or CSA (designMethodOf reads
  // it as the code's own), so that files written before these names stay valid.
  const own = designMethodOf(profile);
  const accepted = si ? [own, 'LRFD'] : ['LRFD', 'ASD'];
  if (!accepted.includes(profile.method)) {
    const why =
      own === 'partial-factor'
        ? `${profile.standard} verifies by partial factors (γM0, γM2); give "method": "partial-factor"`
        : own === 'LSD'
          ? `${profile.standard} is limit states design with resistance factors (φ, φu); give "method": "LSD"`
          : `${profile.standard} offers LRFD or ASD; give "method": "LRFD" or "ASD"`;
    issues.push({
      pointer: '/code/method',
      rule: 'code-method',
      message: `/code/method: ${why} (rule code-method)`,
    });
  }
  const annex = code['nationalAnnex'] as Raw | undefined;
  if (annex) {
    if (profile.standard !== 'EN 1993-1-1') {
      issues.push({
        pointer: '/code/nationalAnnex',
        rule: 'national-annex-standard',
        message: `/code/nationalAnnex: partial factors of a National Annex apply to EN 1993-1-1 only, not ${profile.standard} (rule national-annex-standard)`,
      });
    }
    profile.nationalAnnex = {
      ...(annex['gammaM0'] !== undefined ? { gammaM0: annex['gammaM0'] as number } : {}),
      ...(annex['gammaM2'] !== undefined ? { gammaM2: annex['gammaM2'] as number } : {}),
    };
  }
  return profile;
}
