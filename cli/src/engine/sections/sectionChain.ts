import { chainLegPairs } from './chainLegPairs.js';
import { SectionError } from './sectionError.js';
import { staggerOf } from './staggerOf.js';
import type { SectionChain, SectionLayout, SectionLeg } from './types.js';

/**
 * Net area of one chain of holes across a section, in AREA because thicknesses differ:
 * An = Ag − Σ(hole width × its element's thickness) + Σ(s²/4g × thickness of the element the leg lies
 * in), all × pieces. A leg across a junction takes the thinner thickness (README.md); with the web
 * thickness at the two web-to-flange legs this gives Quimby's Example 3, An = 16.86 in² (conformance/SOURCES.md R5).
 *
 * @param layout - the unfolded section
 * @param chain - positions of the chain's holes in `layout.holes`, any order, at most one per gauge line
 * @returns the chain with holes in unfolded-y order
 * @throws SectionError ('not-a-chain') for an empty chain, a repeated hole or two holes on one gauge line
 * @example
 * // Quimby Example 2 (R4): three web holes of a W14x68 (Ag 20.0, tw 0.415), two legs s = 3, g = 3
 * sectionChain(webLayout, [0, 1, 2]).netArea // → 19.3775  (20.0 − 3(1.0)(0.415) + 2(0.75)(0.415))
 */
export function sectionChain(layout: SectionLayout, chain: readonly number[]): SectionChain {
  if (chain.length === 0) throw new SectionError('not-a-chain', 'a chain needs at least one hole');
  const holes = layout.holes;
  const eps = layout.tolerance;
  for (let i = 0; i < chain.length; i++) {
    const a = holes[chain[i]!];
    if (!a) throw new SectionError('not-a-chain', `no hole at position ${chain[i]}`);
    for (let j = i + 1; j < chain.length; j++) {
      const b = holes[chain[j]!]!;
      if (chain[i] === chain[j]) throw new SectionError('not-a-chain', `hole "${a.id}" appears twice`);
      if (a.element === b.element && Math.abs(a.u - b.u) <= eps) {
        throw new SectionError('not-a-chain', `holes "${a.id}" and "${b.id}" lie on one gauge line`);
      }
    }
  }
  const pieces = layout.section.pieces;
  const ordered = [...chain].sort((p, q) => holes[p]!.y - holes[q]!.y || p - q);
  let deductedArea = 0;
  for (const p of ordered) deductedArea += holes[p]!.deducted * holes[p]!.thickness * pieces;
  const legs: SectionLeg[] = chainLegPairs(layout, ordered).map(([a, b]) => {
    const [from, to] = holes[a]!.y <= holes[b]!.y ? [a, b] : [b, a];
    const { s, g, term } = staggerOf(layout, from, to);
    const thickness = layout.legThickness[from]![to]!;
    return {
      from: holes[from]!.id,
      to: holes[to]!.id,
      s,
      g,
      term,
      thickness,
      area: term * thickness * pieces,
      junctions: layout.legJunctions[from]![to]!,
    };
  });
  let staggerArea = 0;
  for (const leg of legs) staggerArea += leg.area;
  return {
    holes: ordered.map((p) => holes[p]!.id),
    legs,
    deductedArea,
    staggerArea,
    netArea: layout.Ag - deductedArea + staggerArea,
  };
}
