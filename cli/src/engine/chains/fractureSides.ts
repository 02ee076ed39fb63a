import { chainPositions } from './chainPositions.js';
import { directionSign, fractureResiduals } from './fractureResiduals.js';
import { gaugeLines } from './gaugeLines.js';
import { layoutTolerance } from './layoutTolerance.js';
import type { FractureSides, HoleLayout, LoadDirection } from '../types.js';

/**
 * Sorts every hole not in a chain by the side of the chain's fracture line it lies on, for a load
 * direction (cli/docs/method.md §4). Under `-x` the loaded side is the −x side. "Exactly on the line" means
 * within {@link layoutTolerance}.
 *
 * @param chain - the chain (only its hole ids are used)
 * @param layout - the holes and plate
 * @param direction - the load direction
 * @returns the chain's holes and the others by side, each list in increasing y
 * @throws EngineError ('not-a-chain') when the ids are not a chain
 * @example
 * // D.9 straight chain A–D at x = 0: B and C (x = 2.5) are on the far side for -x, loaded for +x
 * fractureSides({ holes: ['A', 'D'] }, d9, '-x').far    // → ['B', 'C']
 * fractureSides({ holes: ['A', 'D'] }, d9, '+x').loaded // → ['B', 'C']
 */
export function fractureSides(
  chain: { readonly holes: readonly string[] },
  layout: HoleLayout,
  direction: LoadDirection,
): FractureSides {
  const positions = chainPositions(layout, chain.holes);
  const lines = gaugeLines(layout);
  const eps = layoutTolerance(layout);
  const residual = fractureResiduals(layout, lines, positions, directionSign(direction));
  const loaded: string[] = [];
  const onLine: string[] = [];
  const far: string[] = [];
  for (const p of lines.order) {
    const r = residual[p]!;
    if (Number.isNaN(r)) continue;
    const id = layout.holes[p]!.id;
    if (r > eps) far.push(id);
    else if (r < -eps) loaded.push(id);
    else onLine.push(id);
  }
  return { direction, chain: [...chain.holes], loaded, onLine, far };
}
