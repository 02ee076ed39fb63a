import { netWidth } from './netWidth.js';
import { staggerTerm } from './staggerTerm.js';
import type { Chain, ChainLeg, HoleLayout } from '../types.js';

/**
 * Builds the chain through holes given by position in `layout.holes`, already known to be a chain
 * (increasing gauge lines). The searches use it; callers with ids use {@link chainOf}, which checks.
 *
 * @param layout - the holes and plate
 * @param positions - positions in `layout.holes`, in increasing y
 * @returns the chain, wn = Wg − Σ d + Σ s²/4g (AISC 360 B4.3b)
 * @example
 * buildChain(d9, [0, 1, 2, 3]).netWidth // → 11.5417
 */
export function buildChain(layout: HoleLayout, positions: readonly number[]): Chain {
  const holes = positions.map((p) => layout.holes[p]!);
  const legs: ChainLeg[] = [];
  for (let i = 1; i < holes.length; i += 1) {
    const a = holes[i - 1]!;
    const b = holes[i]!;
    const s = Math.abs(b.x - a.x);
    const g = b.y - a.y;
    legs.push({ from: a.id, to: b.id, s, g, term: staggerTerm(s, g) });
  }
  const deductedWidths = holes.map((h) => h.deducted);
  const terms = legs.map((l) => l.term);
  const wn = netWidth(layout.width, deductedWidths, terms);
  return {
    holes: holes.map((h) => h.id),
    legs,
    deducted: deductedWidths.reduce((a, b) => a + b, 0),
    staggerSum: terms.reduce((a, b) => a + b, 0),
    netWidth: wn,
    netArea: wn * layout.thickness,
  };
}
