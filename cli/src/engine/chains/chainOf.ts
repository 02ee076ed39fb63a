import { buildChain } from './buildChain.js';
import { chainDefect } from './chainDefect.js';
import { EngineError } from '../engineError.js';
import type { Chain, HoleLayout } from '../types.js';

/**
 * Builds a chain from hole ids: its legs (s, g, s²/4g), deductions and net width (cli/docs/method.md §3,
 * AISC 360 B4.3b: wn = Wg − Σ d + Σ s²/4g, An = wn·t; every hole is deducted in full).
 *
 * @param layout - the holes and plate
 * @param holeIds - ids in increasing y, one per gauge line
 * @returns the chain
 * @throws EngineError ('not-a-chain') when the ids are not a chain (see {@link chainDefect})
 * @example
 * // AISC Design Examples v13.0 D.9: plate 14 × 1/2, holes 0.875 at (0, 2), (2.5, 5), (2.5, 9), (0, 12)
 * chainOf(d9, ['A', 'B', 'C', 'D']).netWidth // → 11.5417 (published 11.5 in)
 * chainOf(d9, ['A', 'D']).netWidth           // → 12.25 (published 12.3 in)
 */
export function chainOf(layout: HoleLayout, holeIds: readonly string[]): Chain {
  const defect = chainDefect(layout, holeIds);
  if (defect)
    throw new EngineError('not-a-chain', `[${holeIds.join(', ')}] is not a chain: ${defect.message}`);
  const position = new Map<string, number>();
  layout.holes.forEach((h, i) => {
    if (!position.has(h.id)) position.set(h.id, i);
  });
  return buildChain(
    layout,
    holeIds.map((id) => position.get(id)!),
  );
}
