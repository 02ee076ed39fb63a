import { formatQuantity } from './formatQuantity.js';
import { makeFinding } from './makeFinding.js';
import { edgeMinimum } from './edgeMinimum.js';
import type { MemberModel } from '../types.js';
import type { Finding } from './types.js';

/**
 * Detailing findings a checker also looks at (cli/docs/method.md §7):
 * - LG201: centre-to-centre spacing below 2-2/3 d (AISC 360 J3.3), d the larger bolt of the pair;
 * - LG202: edge distance across the load (y to each longitudinal edge) below AISC 360 Table J3.4 /
 *   J3.4M plus the Table J3.5 increment C2 for oversized and slotted holes (a slot along the load is
 *   parallel to the edge: C2 = 0); under AISC 360-10 the rolled / thermally cut edge column, the
 *   sheared-edge value named in the message ({@link edgeMinimum}). Edge distance along the load needs
 *   the plate ends, which calc files do not carry, so it is not checked;
 * LG203 (a governing fracture line within a hole's radius of a hole it does not deduct) is made for
 * every member by grazingFindings, called beside this from auditMember.
 * Holes given only by an explicit dimension (no bolt) are skipped for LG201 and LG202.
 *
 * @param model - the member model (a plate: its holes and width; the profile's units and edition)
 * @param memberPointer - JSON pointer of the member, prefixed to each finding's pointer
 * @returns the findings
 * @example
 * // two 3/4 in bolts 1.75 in apart: 2-2/3 · 0.75 = 2.00 in
 * detailingFindings(memberModel(member, aisc), '/members/0')[0]?.code // → 'LG201'
 */
export function detailingFindings(model: MemberModel, memberPointer = ''): Finding[] {
  const { input: member, profile } = model;
  const findings: Finding[] = [];
  const u = profile.units;
  const holes = member.holes;
  const eps = 1e-9 * Math.max(1, member.width);

  // AISC 360 J3.3: minimum spacing 2-2/3 d between centres.
  const largest = Math.max(0, ...holes.map((h) => h.boltDiameter ?? 0));
  const order = holes.map((_, i) => i).sort((a, b) => holes[a]!.y - holes[b]!.y || a - b);
  for (let p = 0; p < order.length; p += 1) {
    const a = holes[order[p]!]!;
    for (let q = p + 1; q < order.length; q += 1) {
      const b = holes[order[q]!]!;
      if (b.y - a.y >= (8 / 3) * largest) break;
      const d = Math.max(a.boltDiameter ?? 0, b.boltDiameter ?? 0);
      if (d === 0) continue;
      const minimum = (8 / 3) * d;
      const distance = Math.hypot(b.x - a.x, b.y - a.y);
      if (distance < minimum - eps) {
        const later = Math.max(order[p]!, order[q]!);
        const [first, second] = order[p]! < order[q]! ? [a, b] : [b, a];
        findings.push(
          makeFinding('LG201', {
            memberId: member.id,
            holes: [first.id, second.id],
            claimed: distance,
            recomputed: minimum,
            message: `Holes ${first.id} and ${second.id} are ${formatQuantity(distance, 'length', u)} apart centre to centre, below 2-2/3 d = ${formatQuantity(minimum, 'length', u)} (AISC 360 J3.3)`,
            pointer: `${memberPointer}/holes/${later}`,
          }),
        );
      }
    }
  }

  // AISC 360 Table J3.4 / J3.4M (+ C2 of Table J3.5): minimum edge distance, measured across the load.
  holes.forEach((hole, i) => {
    const edge = Math.min(hole.y, member.width - hole.y);
    const limit = edgeMinimum(hole, profile, edge);
    if (limit === undefined) return;
    const minimum = limit.minimum;
    if (edge < minimum - eps) {
      findings.push(
        makeFinding('LG202', {
          memberId: member.id,
          holes: [hole.id],
          claimed: edge,
          recomputed: minimum,
          message: `Hole ${hole.id} is ${formatQuantity(edge, 'length', u)} from the ${hole.y <= member.width - hole.y ? 'y = 0' : 'y = width'} edge, below the ${limit.text}`,
          pointer: `${memberPointer}/holes/${i}/y`,
        }),
      );
    }
  });
  return findings;
}
