import { elementHoleGroups } from '../member/elementHoleGroups.js';
import { formatQuantity } from './formatQuantity.js';
import { makeFinding } from './makeFinding.js';
import { edgeMinimum } from './edgeMinimum.js';
import type { MemberModel } from '../types.js';
import type { Finding } from './types.js';

/**
 * AISC 360 detailing of a section member, measured within each element (cli/docs/method.md §7): LG201 spacing
 * below 2-2/3 d (J3.3) between holes of one element, LG202 edge distance below Table J3.4 / J3.4M
 * (+ C2 of Table J3.5 for oversized and slotted holes; AISC 360-10's sheared-edge value in the message)
 * measured to the element's free edges only (an angle's toe, a flange's tips; an angle's heel and a
 * web are joined to other elements and have no edge). On a section the edge of a strip is the
 * element's centreline end, so the toe distance is `a − gauge` exactly. LG203 is measured on the
 * unfolded section by grazingFindings, called beside this from auditMember.
 *
 * @param model - the section member's model (its unfolded holes and widths; the profile's units)
 * @param memberPointer - the member's JSON pointer
 * @returns the findings
 * @example
 * // L4x4x1/2 leg with 3/4 in bolts at 1.5 in pitch: 1.5 < 2.00 → LG201
 * sectionDetailingFindings(memberModel(member, aisc), '/members/0')[0]?.code // → 'LG201'
 */
export function sectionDetailingFindings(model: MemberModel, memberPointer = ''): Finding[] {
  const { input: member, profile } = model;
  const findings: Finding[] = [];
  const u = profile.units;
  for (const group of elementHoleGroups(model)) {
    const eps = 1e-9 * Math.max(1, group.width);
    const holes = group.holes;
    for (let p = 0; p < holes.length; p++) {
      for (let q = p + 1; q < holes.length; q++) {
        const a = holes[p]!;
        const b = holes[q]!;
        const d = Math.max(a.boltDiameter ?? 0, b.boltDiameter ?? 0);
        if (d === 0) continue;
        const minimum = (8 / 3) * d;
        const distance = Math.hypot(b.x - a.x, b.y - a.y);
        if (distance < minimum - eps) {
          findings.push(
            makeFinding('LG201', {
              memberId: member.id,
              holes: [a.id, b.id],
              claimed: distance,
              recomputed: minimum,
              message: `Holes ${a.id} and ${b.id} in ${group.element} are ${formatQuantity(distance, 'length', u)} apart centre to centre, below 2-2/3 d = ${formatQuantity(minimum, 'length', u)} (AISC 360 J3.3)`,
              pointer: `${memberPointer}/holes/${Math.max(a.index, b.index)}`,
            }),
          );
        }
      }
    }
    for (const h of holes) {
      if (h.boltDiameter === undefined) continue;
      const edges = [...(group.free.low ? [h.y] : []), ...(group.free.high ? [group.width - h.y] : [])];
      if (edges.length === 0) continue;
      const edge = Math.min(...edges);
      // Table J3.4 + C2 of Table J3.5 for oversized and slotted holes.
      const limit = edgeMinimum(member.holes[h.index]!, profile, edge);
      if (limit === undefined) continue;
      const minimum = limit.minimum;
      if (edge < minimum - eps) {
        findings.push(
          makeFinding('LG202', {
            memberId: member.id,
            holes: [h.id],
            claimed: edge,
            recomputed: minimum,
            message: `Hole ${h.id} is ${formatQuantity(edge, 'length', u)} from the free edge of ${group.element}, below the ${limit.text}`,
            pointer: `${memberPointer}/holes/${h.index}/gauge`,
          }),
        );
      }
    }
  }
  return findings;
}
