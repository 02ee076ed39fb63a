import { chainDefect } from './chainDefect.js';
import { EngineError } from '../engineError.js';
import type { HoleLayout } from '../types.js';

/**
 * Positions in `layout.holes` of a chain's hole ids, checked to form a chain.
 *
 * @param layout - the holes and plate
 * @param holeIds - the chain's ids in increasing y
 * @returns the positions, in the same order
 * @throws EngineError ('not-a-chain') when the ids are not a chain
 * @example
 * chainPositions(d9, ['A', 'D']) // → [0, 3]
 */
export function chainPositions(layout: HoleLayout, holeIds: readonly string[]): number[] {
  const defect = chainDefect(layout, holeIds);
  if (defect)
    throw new EngineError('not-a-chain', `[${holeIds.join(', ')}] is not a chain: ${defect.message}`);
  const position = new Map<string, number>();
  layout.holes.forEach((h, i) => {
    if (!position.has(h.id)) position.set(h.id, i);
  });
  return holeIds.map((id) => position.get(id)!);
}
