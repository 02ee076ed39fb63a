import type { MemberResult } from '../types.js';
import { formatQuantity } from './formatQuantity.js';
import { makeFinding } from './makeFinding.js';
import type { AuditScope, Finding, MemberClaims } from './types.js';

/**
 * LG132: block shear (AISC 360 J4.3, EN 1993-1-8 3.10.2, CSA S16 13.11) below the tensile strengths
 * while the submitter claims neither a block shear strength nor an available strength that would
 * allow for it (a claimed `available` is compared with the least of the three instead, LG103/LG113).
 *
 * @param result - the member's analysis
 * @param claims - what the submitter claims
 * @param scope - member id, pointer and units
 * @returns the finding, or none
 * @example
 * // L4x4x3/8 brace, φRn 81.1 kips below rupture 92.7 kips, only An claimed
 * blockShearFindings(braceResult, { An: 2.532 }, scope)[0]?.code // → 'LG132'
 */
export function blockShearFindings(result: MemberResult, claims: MemberClaims, scope: AuditScope): Finding[] {
  const block = result.blockShear;
  if (!block || result.governing.limitState !== 'block shear') return [];
  if (claims.available !== undefined || claims.blockShear !== undefined) return [];
  const u = scope.units;
  const tensile = result.rupture.available < result.yielding.available ? result.rupture : result.yielding;
  return [
    makeFinding('LG132', {
      memberId: scope.memberId,
      direction: block.direction,
      recomputed: block.available,
      message: `Block shear ${formatQuantity(block.available, 'force', u)} (${block.clause}${block.projectDefined ? ', staggered tension plane: project-defined' : ''}) is below the tensile ${tensile.limitState} strength ${formatQuantity(tensile.available, 'force', u)}`,
      pointer: `${scope.pointer}/blockShear`,
    }),
  ];
}
