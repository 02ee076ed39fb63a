import { SectionError } from './sectionError.js';
import { sectionChain } from './sectionChain.js';
import { sectionRejection } from './sectionRejection.js';
import type { LoadDirection } from '../types.js';
import type { SectionChain, SectionLayout } from './types.js';

/** Options of {@link sectionChains}. */
export interface SectionChainsOptions {
  /** How many least chains to return (default 10). */
  readonly k?: number;
  /** Refuse layouts with more chains than this (default 500 000). */
  readonly limit?: number;
}

/**
 * The k least chains of an unfolded section by net AREA (thicknesses differ between elements), kept
 * only when they can fracture under the full load from `direction` (null: all chains). Every chain is
 * visited: for each gauge line (holes of one element at one centreline position) no hole or one of its
 * holes, Π(holes per line + 1) − 1 chains (cli/docs/method.md §4). The plate engine's y-ordered shortest-path
 * search does not carry over to tees and W-shapes, whose elements branch; sections rarely have more
 * than a few gauge lines, and layouts above `limit` are refused rather than searched slowly.
 *
 * @param layout - the unfolded section
 * @param direction - load direction, or null for every chain
 * @param options - k and the size limit
 * @returns up to k chains, ascending by net area, ties in enumeration order
 * @throws SectionError ('too-many-chains') above the limit
 * @example
 * // Quimby Example 3 (R5): the least chain of the W14x68 pattern is 4 flange + 2 web holes
 * sectionChains(w14Layout, '-x', { k: 1 })[0]?.netArea // → 16.8646
 */
export function sectionChains(
  layout: SectionLayout,
  direction: LoadDirection | null,
  options: SectionChainsOptions = {},
): SectionChain[] {
  const k = options.k ?? 10;
  const limit = options.limit ?? 500_000;
  if (!(Number.isInteger(k) && k >= 1))
    throw new SectionError('invalid-argument', `k must be a whole number ≥ 1, got ${k}`);
  const holes = layout.holes;
  const eps = layout.tolerance;
  const lines: number[][] = [];
  const order = holes.map((_, p) => p).sort((p, q) => holes[p]!.y - holes[q]!.y || p - q);
  for (const p of order) {
    const h = holes[p]!;
    const line = lines.find(
      (l) => holes[l[0]!]!.element === h.element && Math.abs(holes[l[0]!]!.u - h.u) <= eps,
    );
    if (line) line.push(p);
    else lines.push([p]);
  }
  let count = 1;
  for (const l of lines) {
    count *= l.length + 1;
    if (count - 1 > limit) {
      throw new SectionError('too-many-chains', `the section has more than ${limit} chains of holes`);
    }
  }
  const found: { chain: SectionChain; seq: number }[] = [];
  const current: number[] = [];
  let seq = 0;
  const visit = (l: number): void => {
    if (l === lines.length) {
      if (current.length === 0) return;
      if (direction !== null && sectionRejection(layout, current, direction) !== null) return;
      found.push({ chain: sectionChain(layout, current), seq: seq++ });
      return;
    }
    visit(l + 1);
    for (const p of lines[l]!) {
      current.push(p);
      visit(l + 1);
      current.pop();
    }
  };
  visit(0);
  found.sort((a, b) => a.chain.netArea - b.chain.netArea || a.seq - b.seq);
  return found.slice(0, k).map((f) => f.chain);
}
