import type { CodeProfile, UnitSystem } from '../engine/types.js';
import type { Raw, SemanticIssue } from './normaliseTypes.js';

/**
 * A calc file's `code` as the engine's code profile: standard, design method, the file's units and
 * a National Annex's partial factors. Rules the schema cannot say: EN 1993-1-1 and CSA S16 files are
 * in SI (code-units) and limit states design (code-method), and only EN 1993-1-1 takes a National
 * Annex (national-annex-standard).
 *
 * @param code - the schema-valid `code` object
 * @param units - the file's units
 * @param issues - where the problems go
 * @returns the profile
 * @example
 * normaliseProfile({ standard: 'EN 1993-1-1', method: 'LRFD', nationalAnnex: { gammaM2: 1.1 } }, 'mm', [])
 * // → { standard: 'EN 1993-1-1', method: 'LRFD', units: 'mm', nationalAnnex: { gammaM2: 1.1 } }
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
  if (si && profile.method !== 'LRFD') {
    issues.push({
      pointer: '/code/method',
      rule: 'code-method',
      message: `/code/method: ${profile.standard} is limit states design; give "method": "LRFD" (rule code-method)`,
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
