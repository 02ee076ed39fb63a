import { chainRejection } from './chainRejection.js';
import { leastChains } from './leastChains.js';
import type { HoleLayout, LoadDirection, RankedChain, ChainRejection } from '../types.js';

/**
 * The k least chains over all chains, whether or not they can form, each with the directions in which
 * it can form under the full load and why not in the others (cli/docs/method.md §4). For explaining a result:
 * the least chains that are not admissible show which fastener holds them back.
 *
 * @param layout - the holes and plate
 * @param directions - the directions to judge each chain for
 * @param k - how many chains (default 10)
 * @returns up to k chains ascending by net width, with admissible directions and rejections
 * @example
 * // D.9: the zigzag forms both ways; A–B–C (11.9 in) only under +x (D blocks it under -x)
 * rankChains(d9, ['-x', '+x'], 3).map((c) => [c.holes.join('-'), c.admissible])
 * // → [['A-B-C-D', ['-x', '+x']], ['A-B-C', ['+x']], ['B-C-D', ['+x']]]
 */
export function rankChains(layout: HoleLayout, directions: readonly LoadDirection[], k = 10): RankedChain[] {
  return leastChains(layout, null, k).map((chain) => {
    const admissible: LoadDirection[] = [];
    const rejections: ChainRejection[] = [];
    for (const direction of directions) {
      const rejection = chainRejection(chain, layout, direction);
      if (rejection) rejections.push(rejection);
      else admissible.push(direction);
    }
    return { ...chain, admissible, rejections };
  });
}
