import type { SectionChain } from '../sections/types.js';
import type { Chain } from '../types.js';

/**
 * A section chain in the plate chain's shape, so results and claims read the same for plates and
 * rolled shapes: `deducted` and `staggerSum` are widths (Σ hole widths, Σ s²/4g), `netArea` the
 * section's, and `netWidth` = netArea / (pieces · thickness), the width of a flat plate of the
 * member's (first element's) thickness with the same net area.
 *
 * @param chain - the section chain (areas of all pieces)
 * @param thickness - the member's thickness (its first element's)
 * @param pieces - identical pieces acting together (2 for a double angle)
 * @returns the chain in plate terms
 * @example
 * // one hole of a 2L6x6x5/8: 0.9375 in × 0.625 in × 2 = 1.1719 in² deducted from Ag 14.26 in²
 * sectionChainAsChain({ holes: ['A'], legs: [], deductedArea: 1.171875, staggerArea: 0, netArea: 13.088125 }, 0.625, 2).deducted
 * // → 0.9375
 */
export function sectionChainAsChain(chain: SectionChain, thickness: number, pieces: number): Chain {
  return {
    holes: chain.holes,
    legs: chain.legs.map((l) => ({ from: l.from, to: l.to, s: l.s, g: l.g, term: l.term })),
    deducted: chain.deductedArea / (pieces * thickness),
    staggerSum: chain.legs.reduce((sum, l) => sum + l.term, 0),
    netWidth: chain.netArea / (pieces * thickness),
    netArea: chain.netArea,
  };
}
