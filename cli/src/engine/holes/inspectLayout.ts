import { holeOutline, type HoleOutline } from './holeOutline.js';
import { holeWidth } from './holeWidth.js';
import { segmentDistance } from '../geometry/segmentDistance.js';
import type { CodeProfile, HoleInput, InputIssue, MemberInput } from '../types.js';

/** Nominal dimensions of a hole: from the table when a profile is given, else explicit or the bolt. */
function nominal(
  hole: HoleInput,
  profile: CodeProfile | undefined,
): { across: number; along: number } | null {
  if (hole.dimension) return hole.dimension;
  if (!profile)
    return hole.boltDiameter === undefined ? null : { across: hole.boltDiameter, along: hole.boltDiameter };
  try {
    const w = holeWidth(hole, profile);
    return { across: w.nominalAcross, along: w.nominalAlong };
  } catch {
    // A bolt size the table does not know is reported by the loader as its own error.
    return null;
  }
}

function fmt(value: number): string {
  return Number(value.toFixed(4)).toString();
}

/**
 * Problems with a member's hole layout that make the calc file invalid (cli/docs/method.md §7): a hole whose
 * centre lies outside 0 ≤ y ≤ width or whose outline reaches past a longitudinal edge (LG301), two
 * holes whose outlines intersect (LG302), two holes with one id (LG303). Outlines use the nominal hole
 * dimensions (without the damage allowance): from the hole table when `profile` is given, else the
 * explicit dimension or, failing that, the bolt diameter.
 *
 * @param member - the member
 * @param profile - code edition and units, for the hole table (optional)
 * @returns the issues, each with a JSON pointer suffix relative to the member
 * @example
 * // a 3/4 in bolt at y = 0.3 in a 14 in plate: its 13/16 in hole reaches past the edge y = 0
 * inspectLayout(member, profile)[0]
 * // → { code: 'LG301', name: 'hole-outside-member', rule: 'hole-outside-member', pointer: '/holes/0', … }
 */
export function inspectLayout(member: MemberInput, profile?: CodeProfile): InputIssue[] {
  const issues: InputIssue[] = [];
  const eps = 1e-9 * Math.max(1, member.width);
  const firstIndex = new Map<string, number>();
  member.holes.forEach((hole, i) => {
    const first = firstIndex.get(hole.id);
    if (first === undefined) {
      firstIndex.set(hole.id, i);
      return;
    }
    issues.push({
      code: 'LG303',
      name: 'duplicate-hole-id',
      rule: 'duplicate-hole-id',
      message: `Hole id ${hole.id} is used by holes ${first} and ${i}; hole ids must be unique in a member`,
      pointer: `/holes/${i}/id`,
      holes: [hole.id],
    });
  });

  const outlines: (HoleOutline | null)[] = member.holes.map((hole, i) => {
    if (hole.y < -eps || hole.y > member.width + eps) {
      issues.push({
        code: 'LG301',
        name: 'hole-outside-member',
        rule: 'hole-outside-member',
        message: `Hole ${hole.id} is centred at y = ${fmt(hole.y)}, outside the plate width 0 to ${fmt(member.width)}`,
        pointer: `/holes/${i}`,
        holes: [hole.id],
      });
      return null;
    }
    const dims = nominal(hole, profile);
    if (!dims) return null;
    const low = hole.y - dims.across / 2;
    const high = hole.y + dims.across / 2;
    if (low < -eps || high > member.width + eps) {
      issues.push({
        code: 'LG301',
        name: 'hole-outside-member',
        rule: 'hole-outside-member',
        message: `Hole ${hole.id} (${fmt(dims.across)} across, centred at y = ${fmt(hole.y)}) reaches past the plate edge at y = ${low < -eps ? 0 : fmt(member.width)}`,
        pointer: `/holes/${i}`,
        holes: [hole.id],
      });
    }
    return holeOutline(hole.x, hole.y, dims.across, dims.along);
  });

  // Pairs sorted by the low y of their outline, so the scan stops once outlines cannot meet across.
  const reach = outlines.map((o) =>
    o ? Math.max(o.a[1], o.b[1]) - Math.min(o.a[1], o.b[1]) + 2 * o.radius : 0,
  );
  const maxReach = Math.max(0, ...reach);
  const order = member.holes.map((_, i) => i).filter((i) => outlines[i]);
  order.sort((a, b) => member.holes[a]!.y - member.holes[b]!.y || a - b);
  for (let u = 0; u < order.length; u += 1) {
    const i = order[u]!;
    const oi = outlines[i]!;
    for (let v = u + 1; v < order.length; v += 1) {
      const j = order[v]!;
      if (member.holes[j]!.y - member.holes[i]!.y > maxReach) break;
      const oj = outlines[j]!;
      const gap = segmentDistance(oi.a, oi.b, oj.a, oj.b) - oi.radius - oj.radius;
      if (gap < -eps) {
        const [first, second] = i < j ? [i, j] : [j, i];
        const a = member.holes[first]!;
        const b = member.holes[second]!;
        issues.push({
          code: 'LG302',
          name: 'holes-overlap',
          rule: 'holes-overlap',
          message: `Holes ${a.id} and ${b.id} overlap by ${fmt(-gap)}`,
          pointer: `/holes/${second}`,
          holes: [a.id, b.id],
        });
      }
    }
  }
  return issues;
}
