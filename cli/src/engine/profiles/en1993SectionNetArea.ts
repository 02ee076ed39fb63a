import { sectionChains } from '../sections/sectionChains.js';
import type { SectionChain, SectionLayout } from '../sections/types.js';
import type { LoadDirection } from '../types.js';

/** Net area of a section by EN 1993-1-1 6.2.2.2, with both deductions shown. */
export interface En1993SectionNetArea {
  /** A − max(straight, staggered deduction), never above A. */
  readonly Anet: number;
  /** Largest deduction over straight fracture lines (every leg with s = 0), as an area. */
  readonly straightDeduction: number;
  /** Largest deduction t(n·d0 − Σ s²/4p) over staggered lines, as an area (0 when there are none). */
  readonly staggeredDeduction: number;
  /** The chain whose deduction governs, or null with no admissible chain. */
  readonly chain: SectionChain | null;
}

/**
 * Net area of an unfolded section (holes sized d0, no allowance) by EN 1993-1-1 6.2.2.2: the larger of
 * the straight and the staggered deduction over the chains that can form for the load direction.
 * Element thicknesses are carried per hole and per leg, as in ../sections.
 *
 * @param layout - the unfolded section, holes with `deducted` = d0
 * @param direction - load direction, or null for every chain
 * @returns Anet and the two deductions
 * @example
 * // SBE Part 8 WE3 (R7): L120×80×12, three M20 (d0 22) in one row: straight deduction 264 mm²
 * en1993SectionNetArea(l120Layout, '-x') // → { Anet: 2006, straightDeduction: 264, staggeredDeduction: 0, … }
 */
export function en1993SectionNetArea(
  layout: SectionLayout,
  direction: LoadDirection | null,
): En1993SectionNetArea {
  const chains = sectionChains(layout, direction, { k: 1_000_000 });
  let straightDeduction = 0;
  let staggeredDeduction = 0;
  let chain: SectionChain | null = null;
  let best = 0;
  for (const c of chains) {
    const deduction = layout.Ag - c.netArea;
    if (c.legs.every((l) => l.s === 0)) straightDeduction = Math.max(straightDeduction, deduction);
    else staggeredDeduction = Math.max(staggeredDeduction, deduction);
    if (chain === null || deduction > best) {
      best = deduction;
      chain = c;
    }
  }
  return {
    Anet: layout.Ag - Math.max(0, straightDeduction, staggeredDeduction),
    straightDeduction,
    staggeredDeduction,
    chain,
  };
}
