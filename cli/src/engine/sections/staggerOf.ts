import { staggerTerm } from '../chains/staggerTerm.js';
import { SectionError } from './sectionError.js';
import type { SectionLayout } from './types.js';

/**
 * Stagger s, centreline gauge g and s²/(4g) between two holes of an unfolded section (AISC 360
 * B4.3b; EN 1993-1-1 6.2.2.2 writes the same term as s²/4p).
 *
 * @param layout - the unfolded section
 * @param a - position of one hole in `layout.holes`
 * @param b - position of the other
 * @returns s = |xa − xb|, g along the centrelines, term = s²/(4g)
 * @throws SectionError ('not-a-chain') when the two holes share a gauge line (g = 0)
 * @example
 * // W14x68 web holes 3 apart, staggered 3: 3²/(4·3) = 0.75 (Quimby Example 2)
 * staggerOf(webLayout, 0, 1) // → { s: 3, g: 3, term: 0.75 }
 */
export function staggerOf(
  layout: SectionLayout,
  a: number,
  b: number,
): { s: number; g: number; term: number } {
  const ha = layout.holes[a]!;
  const hb = layout.holes[b]!;
  const g = layout.gauges[a]![b]!;
  if (!(g > layout.tolerance)) {
    throw new SectionError('not-a-chain', `holes "${ha.id}" and "${hb.id}" lie on one gauge line`);
  }
  const s = Math.abs(ha.x - hb.x);
  return { s, g, term: staggerTerm(s, g) };
}
