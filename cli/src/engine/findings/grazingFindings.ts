import { formatDirection } from './formatDirection.js';
import { formatQuantity } from './formatQuantity.js';
import { makeFinding } from './makeFinding.js';
import type { Point } from '../geometry/point.js';
import { segmentDistance } from '../geometry/segmentDistance.js';
import { sectionLineDistances } from '../sections/sectionLineDistances.js';
import type { MemberInput, MemberModel, MemberResult } from '../types.js';
import type { Finding } from './types.js';

/**
 * Distance from each hole to a plate chain's fracture line: straight across at the first hole's x
 * from y = 0, hole to hole, straight at the last hole's x to y = width (cli/docs/method.md §3). A segment whose
 * y-span stays a radius clear of a hole cannot graze it and is skipped (the hole then reads +∞).
 */
function plateLineDistances(
  member: MemberInput,
  chain: readonly string[],
  radii: readonly number[],
): number[] {
  const byId = new Map(member.holes.map((h) => [h.id, h] as const));
  const chainHoles = chain.map((id) => byId.get(id)!);
  const first = chainHoles[0]!;
  const last = chainHoles[chainHoles.length - 1]!;
  const points: Point[] = [[first.x, 0], ...chainHoles.map((h): Point => [h.x, h.y]), [last.x, member.width]];
  const inChain = new Set(chain);
  return member.holes.map((hole, i) => {
    if (inChain.has(hole.id)) return Number.NaN;
    const radius = radii[i]!;
    const centre: Point = [hole.x, hole.y];
    let distance = Number.POSITIVE_INFINITY;
    for (let s = 1; s < points.length; s += 1) {
      const a = points[s - 1]!;
      const b = points[s]!;
      if (centre[1] < Math.min(a[1], b[1]) - radius || centre[1] > Math.max(a[1], b[1]) + radius) continue;
      distance = Math.min(distance, segmentDistance(a, b, centre, centre));
    }
    return distance;
  });
}

/**
 * LG203: a governing fracture line passing within a hole's radius (deducted width / 2) of a hole it
 * does not deduct; the real fracture would run through that hole. Each distinct governing chain is
 * checked once. On a plate the line is the chain's polyline across the width; on a section member
 * (angle, tee, W-shape, channel) it is the unfolded fracture line the chain search judges
 * admissibility against (cli/src/engine/sections/README.md §6, {@link sectionLineDistances}): legs
 * along the centrelines across heels and web-to-flange junctions, straight across beyond them. The
 * check is geometric and made under every code profile. Pointers name the hole in the member's
 * `holes` array.
 *
 * @param model - the member model (holes, their widths, a section's unfolded layout, units)
 * @param result - its analysis (the governing chains)
 * @param memberPointer - the member's JSON pointer
 * @returns the findings, by direction then hole order
 * @example
 * // chain A–E–C straight at x 0; a long slot B (radius 0.96875 in) on E's gauge line 0.85 in along
 * grazingFindings(memberModel(member, aisc), result, '/members/0')[0]?.pointer // → '/members/0/holes/2'
 */
export function grazingFindings(model: MemberModel, result: MemberResult, memberPointer = ''): Finding[] {
  const { input: member, profile } = model;
  const findings: Finding[] = [];
  const u = profile.units;
  const radii = model.holeWidths.map((w) => w.deducted / 2);
  const layout = model.unfolded;
  const position = new Map((layout?.holes ?? []).map((h, i) => [h.id, i] as const));
  const eps = layout ? layout.tolerance : 1e-9 * Math.max(1, member.width);
  const seen = new Set<string>();
  for (const d of result.directions) {
    const chain = d.governing;
    if (!chain || chain.holes.length === 0) continue;
    const key = chain.holes.join('\u0000');
    if (seen.has(key)) continue;
    seen.add(key);
    const distances = layout
      ? sectionLineDistances(
          layout,
          chain.holes.map((id) => position.get(id)!),
        )
      : plateLineDistances(member, chain.holes, radii);
    member.holes.forEach((hole, i) => {
      const distance = distances[i]!;
      const radius = radii[i]!;
      if (!(distance < radius - eps)) return;
      const where = layout ? ` (${layout.holes[i]!.element})` : '';
      findings.push(
        makeFinding('LG203', {
          memberId: member.id,
          direction: d.direction,
          chain: chain.holes,
          holes: [hole.id],
          claimed: distance,
          recomputed: radius,
          message: `The governing fracture line (chain ${chain.holes.join('-')}, ${formatDirection(d.direction)}) passes ${formatQuantity(distance, 'length', u)} from the centre of hole ${hole.id}${where}, within its radius ${formatQuantity(radius, 'length', u)}`,
          pointer: `${memberPointer}/holes/${i}`,
        }),
      );
    });
  }
  return findings;
}
