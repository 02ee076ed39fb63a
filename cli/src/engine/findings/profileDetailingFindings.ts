import { elementHoleGroups } from '../member/elementHoleGroups.js';
import { makeFinding } from './makeFinding.js';
import { holeSpacings } from '../profiles/holeSpacings.js';
import { tensionProfileOf } from '../strength/tensionProfileOf.js';
import type { MemberModel } from '../types.js';
import type { Finding } from './types.js';

/**
 * Detailing under the EN 1993-1-1 and CSA S16-19 profiles, per flat element: EN 1993-1-8 Table 3.3
 * minima e1, e2 ≥ 1.2 d0, p1 ≥ 2.2 d0, p2 ≥ 2.4 d0 — staggered lines p2 ≥ 1.2 d0 with L ≥ 2.4 d0
 * (note 5) — (LG204) and maxima e ≤ 4t + 40 mm, p ≤ min(14t, 200 mm) (LG205), which note 1 applies
 * to tension members only when exposed to the weather or corrosion: calc files do not say, so LG205
 * is not raised from a file today; CSA S16 22.3.1 centre-to-centre spacing ≥ 2.7 d (LG206). e2 is
 * measured from the gauge line nearest each free edge of the element (holes next to an edge); e1 is
 * the block-shear end distance when one is given (calc files carry no member ends otherwise). p1 is
 * the least pitch along a gauge line, p2 the least spacing of adjacent gauge lines, L the least
 * centre-to-centre distance.
 *
 * @param model - the member model, under an EN 1993-1-1 or CSA S16-19 profile (others give no
 *   findings)
 * @param memberPointer - the member's JSON pointer
 * @returns the findings
 * @example
 * // EN plate, M20 (d0 22) holes 40 mm apart along the load: p1 40 < 2.2·22 = 48.4 → LG204
 * profileDetailingFindings(memberModel(member, en), '/members/0')[0]?.code // → 'LG204'
 */
export function profileDetailingFindings(model: MemberModel, memberPointer = ''): Finding[] {
  const { input: member, profile } = model;
  const tension = tensionProfileOf(profile);
  if (!tension) return [];
  const findings: Finding[] = [];
  for (const group of elementHoleGroups(model)) {
    const holes = group.holes;
    if (holes.length === 0) continue;
    const spacings = holeSpacings(holes, group.width);
    // Edge distances belong to the holes next to a free edge: the gauge line nearest each free edge
    // (a hole on an inner line has neighbours between it and the edge, not an edge distance).
    const ys = holes.map((h) => h.y);
    const edges = [
      ...(group.free.low ? [Math.min(...ys)] : []),
      ...(group.free.high ? [group.width - Math.max(...ys)] : []),
    ];
    const bolts = holes.map((h) => h.boltDiameter).filter((d): d is number => d !== undefined);
    const e1 = member.blockShear?.endDistance;
    const eMax = Math.max(...(edges.length ? edges : [0]), e1 ?? 0);
    const issues = tension.detailing({
      d0: Math.max(...holes.map((h) => h.nominal)),
      ...(bolts.length ? { boltDiameter: Math.max(...bolts) } : {}),
      t: group.thickness,
      ...(e1 !== undefined ? { e1 } : {}),
      ...(edges.length ? { e2: Math.min(...edges) } : {}),
      ...(spacings.p1 !== undefined ? { p1: spacings.p1 } : {}),
      ...(spacings.p2 !== undefined ? { p2: spacings.p2 } : {}),
      ...(spacings.p2Staggered !== undefined ? { p2Staggered: spacings.p2Staggered } : {}),
      ...(spacings.L !== undefined ? { L: spacings.L } : {}),
      ...(eMax > 0 ? { eMax } : {}),
      ...(spacings.pMax !== undefined ? { pMax: spacings.pMax } : {}),
    });
    for (const issue of issues) {
      const code = profile.standard === 'CSA S16-19' ? 'LG206' : issue.kind === 'minimum' ? 'LG204' : 'LG205';
      findings.push(
        makeFinding(code, {
          memberId: member.id,
          holes: holes.map((h) => h.id),
          claimed: issue.value,
          recomputed: issue.limit,
          message: `${group.element === 'plate' ? 'Plate' : `Element ${group.element}`}: ${issue.message} (${issue.clause})`,
          pointer: `${memberPointer}/holes`,
        }),
      );
    }
  }
  return findings;
}
