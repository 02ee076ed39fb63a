import type { MemberResult } from '../types.js';
import { formatDirection } from './formatDirection.js';
import { formatQuantity } from './formatQuantity.js';
import { makeFinding } from './makeFinding.js';
import type { AuditScope, Finding } from './types.js';

/**
 * LG131, the equal-share rule (cli/docs/method.md §4): with every fastener taking an equal share, a
 * chain whose An / share falls below the full-load An of its direction is reported beside it.
 *
 * @param result - the member's analysis (each direction's equal-share chain, plates only)
 * @param scope - member id, pointer and units
 * @returns one finding per direction where An / share is the lower
 * @example
 * // plate 10 × 1, holes 1.0 wide at A (0, 3), B (0, 7), C (3, 5), loaded from +x: A–B leaves C on
 * // the loaded side, so C alone (9 in², all shares) is compared; An/share 12 ≥ 8: nothing raised
 * equalShareFindings(result, scope) // → []
 */
export function equalShareFindings(result: MemberResult, scope: AuditScope): Finding[] {
  const u = scope.units;
  return result.directions.flatMap((d) => {
    const share = d.share;
    if (!share || !(share.equivalentArea < d.An * (1 - 1e-9))) return [];
    return [
      makeFinding('LG131', {
        memberId: scope.memberId,
        direction: d.direction,
        chain: share.chain.holes,
        claimed: d.An,
        recomputed: share.equivalentArea,
        message: `Equal-share check for ${formatDirection(d.direction)}: chain ${share.chain.holes.join('-')} carries ${share.fastenersCarried} of ${share.fastenersTotal} fasteners; An/share ${formatQuantity(share.equivalentArea, 'area', u)} is below the full-load An ${formatQuantity(d.An, 'area', u)}`,
        pointer: `${scope.pointer}/holes`,
      }),
    ];
  });
}
