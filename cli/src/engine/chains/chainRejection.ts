import { chainPositions } from './chainPositions.js';
import { directionSign, fractureResiduals } from './fractureResiduals.js';
import { gaugeLines } from './gaugeLines.js';
import { layoutTolerance } from './layoutTolerance.js';
import type { ChainRejection, HoleLayout, LoadDirection } from '../types.js';

/**
 * Why a chain cannot fracture under the full load from a direction, or null when it can
 * (cli/docs/method.md §4: every hole not in the chain must lie strictly on the far side of the fracture line;
 * a hole exactly on the line belongs to a different chain).
 *
 * @param chain - the chain (only its hole ids are used)
 * @param layout - the holes and plate
 * @param direction - the load direction
 * @returns the first blocking hole in increasing y with the reason, or null
 * @throws EngineError ('not-a-chain') when the ids are not a chain
 * @example
 * // D.9: the straight chain A–D at x = 0 forms under -x; under +x, B (x = 2.5) is on the loaded side
 * chainRejection({ holes: ['A', 'D'] }, d9, '-x') // → null
 * chainRejection({ holes: ['A', 'D'] }, d9, '+x') // → { direction: '+x', blockingHole: 'B', reason: 'loaded-side' }
 */
export function chainRejection(
  chain: { readonly holes: readonly string[] },
  layout: HoleLayout,
  direction: LoadDirection,
): ChainRejection | null {
  const positions = chainPositions(layout, chain.holes);
  const lines = gaugeLines(layout);
  const eps = layoutTolerance(layout);
  const residual = fractureResiduals(layout, lines, positions, directionSign(direction));
  for (const p of lines.order) {
    const r = residual[p]!;
    if (Number.isNaN(r) || r > eps) continue;
    return { direction, blockingHole: layout.holes[p]!.id, reason: r < -eps ? 'loaded-side' : 'on-line' };
  }
  return null;
}
