import { staggerOf } from './staggerOf.js';
import type { SectionLayout } from './types.js';

/**
 * Which holes of a chain are joined by a gauge space (a leg), as pairs of positions in
 * `layout.holes`. Two chain holes are neighbours when no other chain hole lies on the centreline path
 * between them. Along a line of elements (plates, angles, channels) that gives the consecutive holes,
 * as on a plate (cli/docs/method.md §3). Where a web meets a flange's middle with chain holes on both sides of the
 * web and in the web, the three are all neighbours: the flange's own leg is kept, and the web's hole
 * is joined to whichever flange hole gives the smaller s²/4g (the lesser net area; the conservative
 * reading of the fracture continuing from the flange into the web). This reproduces the single
 * junction term per flange of T. B. Quimby, *A Beginner's Guide to the Steel Construction Manual*,
 * failure-path tutorial Example 3 (conformance/SOURCES.md R5).
 *
 * @param layout - the unfolded section
 * @param chain - positions of the chain's holes in `layout.holes`
 * @returns one pair per leg: chain.length − 1 pairs for a chain of two or more holes
 * @example
 * // angle: one hole in each leg → one leg across the heel
 * chainLegPairs(angleLayout, [0, 1]) // → [[0, 1]]
 */
export function chainLegPairs(layout: SectionLayout, chain: readonly number[]): [number, number][] {
  const D = layout.gauges;
  const eps = layout.tolerance;
  const holes = layout.holes;
  const same: [number, number][] = [];
  const cross: { pair: [number, number]; term: number }[] = [];
  for (let i = 0; i < chain.length; i++) {
    for (let j = i + 1; j < chain.length; j++) {
      const a = chain[i]!;
      const b = chain[j]!;
      let between = false;
      for (const c of chain) {
        if (c === a || c === b) continue;
        if (D[a]![c]! + D[c]![b]! - D[a]![b]! <= eps) {
          between = true;
          break;
        }
      }
      if (between) continue;
      if (holes[a]!.element === holes[b]!.element) same.push([a, b]);
      else cross.push({ pair: [a, b], term: staggerOf(layout, a, b).term });
    }
  }
  cross.sort((p, q) => p.term - q.term);
  // Kruskal: the element's own legs first, then the junction legs by increasing term.
  const parent = new Map<number, number>(chain.map((p) => [p, p]));
  const root = (p: number): number => {
    let r = p;
    while (parent.get(r) !== r) r = parent.get(r)!;
    return r;
  };
  const legs: [number, number][] = [];
  for (const pair of [...same, ...cross.map((c) => c.pair)]) {
    const ra = root(pair[0]);
    const rb = root(pair[1]);
    if (ra === rb) continue;
    parent.set(rb, ra);
    legs.push(pair);
  }
  return legs;
}
