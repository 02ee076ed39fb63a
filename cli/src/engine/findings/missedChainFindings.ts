import { sameHoles } from '../chains/sameHoles.js';
import type { MemberResult } from '../types.js';
import type { AdmissibleClaim } from './claimedChainFindings.js';
import { formatDirection } from './formatDirection.js';
import { formatQuantity } from './formatQuantity.js';
import { makeFinding } from './makeFinding.js';
import { withinTolerance } from './withinTolerance.js';
import type { AuditScope, Finding, MemberClaims } from './types.js';

/**
 * LG121, the governing chain of a direction missing from the claimed chains (cli/docs/method.md §8):
 * raised when chains are claimed and none that can form in that direction is the governing chain or
 * as narrow as it. An error when the governing net area is below the claimed An (or, with no An
 * claimed, the least claimed chain's net area) beyond the tolerance, a warning otherwise.
 *
 * @param result - the member's analysis
 * @param claims - what the submitter claims
 * @param admissible - the claimed chains that can form ({@link claimedChainFindings})
 * @param thickness - the member's thickness, for the claimed chains' net areas
 * @param scope - member id, pointer, units and tolerance
 * @returns one finding per direction whose governing chain was missed
 * @example
 * // D.9 claimed with only the straight chain A–D: A–B–C–D (11.54 in) governs and was missed
 * missedChainFindings(d9Result, { chains: [{ holes: ['A', 'D'] }] }, admissible, 0.5, scope)[0]?.chain // → ['A', 'B', 'C', 'D']
 */
export function missedChainFindings(
  result: MemberResult,
  claims: MemberClaims,
  admissible: readonly AdmissibleClaim[],
  thickness: number,
  scope: AuditScope,
): Finding[] {
  if (!claims.chains) return [];
  const u = scope.units;
  const findings: Finding[] = [];
  const claimedLeast = admissible.length
    ? Math.min(...admissible.map((c) => (c.claimed.netWidth ?? c.chain.netWidth) * thickness))
    : undefined;
  const reference = claims.An ?? claimedLeast;
  for (const d of result.directions) {
    const governing = d.governing;
    if (!governing) continue;
    const covered = admissible.some(
      (c) =>
        c.directions.includes(d.direction) &&
        (sameHoles(c.chain.holes, governing.holes) ||
          c.chain.netWidth <= governing.netWidth + 1e-9 * Math.max(1, Math.abs(governing.netWidth))),
    );
    if (covered) continue;
    const below =
      reference === undefined ||
      (governing.netArea < reference &&
        !withinTolerance(reference, governing.netArea, 'area', scope.tolerance));
    findings.push(
      makeFinding('LG121', {
        memberId: scope.memberId,
        severity: below ? 'error' : 'warning',
        direction: d.direction,
        chain: governing.holes,
        recomputed: governing.netArea,
        ...(reference !== undefined ? { claimed: reference } : {}),
        message: `Governing chain ${governing.holes.join('-')} for ${formatDirection(d.direction)} (net width ${formatQuantity(governing.netWidth, 'length', u)}, An ${formatQuantity(governing.netArea, 'area', u)}) is not among the claimed chains${reference !== undefined ? `; claimed An ${formatQuantity(reference, 'area', u)}` : ''}`,
        pointer: `${scope.pointer}/claims/chains`,
      }),
    );
  }
  return findings;
}
