import type { Point } from '../geometry/point.js';
import { segmentDistance } from '../geometry/segmentDistance.js';
import { chainLegPairs } from './chainLegPairs.js';
import { legProjection, sectionLineAt } from './sectionLinePoint.js';
import type { SectionLayout } from './types.js';

/**
 * Distance from every hole's centre to a section chain's fracture line, measured on the unfolded
 * section (README.md §6): the line runs along each leg's centreline path with x linear in the distance
 * along it, and straight across (constant x) beyond the end holes and along elements the chain does not
 * enter. Elements are strips along x joined at junctions, so two points are hypot(Δx, centreline
 * distance) apart; across an angle's heel that is the plate distance on the flat width a + b − t, and
 * a hole in a flange half the chain does not enter is measured through the web-to-flange junction,
 * never across the drawing's flange-then-web layout. For a hole `offset` off a leg's path, meeting it
 * `along` from the leg's start, the centreline distance to the path point at w is offset + |w − along|,
 * so each leg is two plane segments in (x, w) with the hole at w = along ± offset.
 *
 * @param layout - the unfolded section
 * @param chain - positions of the chain's holes in `layout.holes`
 * @returns one distance per hole position, NaN for the chain's own holes
 * @example
 * // L4x4x1/2: chain F (leg b, x 0) – A (leg a, x 3), 3.5 apart across the heel; B on F's gauge line at x 1
 * sectionLineDistances(lay, [fPos, aPos])[bPos] // → 0.7593 (1 · 3.5 / √(3² + 3.5²))
 */
export function sectionLineDistances(layout: SectionLayout, chain: readonly number[]): number[] {
  const holes = layout.holes;
  const eps = layout.tolerance;
  const inChain = new Set(chain);
  const legs = chainLegPairs(layout, chain);
  return holes.map((h, p) => {
    if (inChain.has(p)) return Number.NaN;
    // The part of the line the hole is judged against: beyond the legs it runs straight across the
    // hole's own position, at the x where it leaves them.
    const at = sectionLineAt(layout, chain, legs, p);
    let distance = at.offset > eps || legs.length === 0 ? Math.abs(h.x - at.x) : Number.POSITIVE_INFINITY;
    for (const [a, b] of legs) {
      const leg = legProjection(layout, a, b, p);
      if (leg.offset >= distance) continue;
      // Points (x, distance along the leg's developed centreline from hole a).
      const start: Point = [holes[a]!.x, 0];
      const meet: Point = [leg.x, leg.along];
      const end: Point = [holes[b]!.x, leg.length];
      const before: Point = [h.x, leg.along + leg.offset];
      const after: Point = [h.x, leg.along - leg.offset];
      distance = Math.min(
        distance,
        segmentDistance(start, meet, before, before),
        segmentDistance(meet, end, after, after),
      );
    }
    return distance;
  });
}
