import { chainLegPairs } from './chainLegPairs.js';
import { sectionLineAt } from './sectionLinePoint.js';
import type { LoadDirection } from '../types.js';
import type { SectionChainRejection, SectionLayout } from './types.js';

/**
 * Whether a chain can fracture under the full load from a direction (cli/docs/method.md §4): every hole not in the
 * chain must lie strictly on the far side of the fracture line (+x side for `-x`). The line runs
 * between the chain's holes along each leg's centreline path, x varying linearly with the distance
 * along it, and straight across (constant x) from the end holes to the free edges and along any
 * element the chain does not enter, from where it leaves the chain's legs. A hole is judged against
 * the nearest part of the line (on a tie, a leg inside the hole's own element); this is the plate rule
 * of cli/docs/method.md §4 when the section is one element.
 *
 * @param layout - the unfolded section
 * @param chain - positions of the chain's holes in `layout.holes`
 * @param direction - load direction
 * @returns null when the chain can form, else the first blocking hole in unfolded-y order
 * @example
 * // angle, holes A (leg a, x 0) and B (leg b, x 3) in the chain, C in leg b at x 1.5 between them
 * sectionRejection(lay, [0, 1], '-x') // → { direction: '-x', blockingHole: 'C', reason: 'loaded-side' }
 */
export function sectionRejection(
  layout: SectionLayout,
  chain: readonly number[],
  direction: LoadDirection,
): SectionChainRejection | null {
  const holes = layout.holes;
  const eps = layout.tolerance;
  const sign = direction === '-x' ? 1 : -1;
  const inChain = new Set(chain);
  const legs = chainLegPairs(layout, chain);
  const order = holes.map((_, p) => p).sort((p, q) => holes[p]!.y - holes[q]!.y || p - q);
  for (const p of order) {
    if (inChain.has(p)) continue;
    const h = holes[p]!;
    const lineX = sectionLineAt(layout, chain, legs, p).x;
    const residual = sign * (h.x - lineX);
    if (residual > eps) continue;
    return { direction, blockingHole: h.id, reason: residual < -eps ? 'loaded-side' : 'on-line' };
  }
  return null;
}
