import type { SectionLayout } from '../../sections/types.js';
import type { LoadDirection } from '../../types.js';
import { BlockShearError } from './blockShearError.js';
import type { BlockShearLayout } from './types.js';

/**
 * The block shear layout of an unfolded section (../sections), so a member's bolt group goes straight
 * to {@link blockOutlines}: every element with its own material (an element's `areaWidth` beyond or
 * short of its centreline span is shared among its ends at junctions: an angle leg reaches the back of
 * the heel, a channel flange starts at the web's face), the junctions, and the holes of the elements
 * that tear out (the others are left out of the bolt group).
 *
 * @param layout - the unfolded section
 * @param elements - ids of the connected elements whose holes form the bolt group
 * @param direction - load direction (the block tears toward the member's free end)
 * @param endX - x of the member's free end
 * @returns the layout; holes keep their deducted widths
 * @throws BlockShearError when an element is unknown or the elements have no holes
 * @example
 * // 2L6x6x5/8 with 9 bolts in leg a (R6): both legs, the heel junction, leg a from the back of the heel
 * sectionBlockLayout(twoL6x6Layout, ['leg-a'], '-x', 28.25).elements[0]?.extendLow // → 0.3125
 */
export function sectionBlockLayout(
  layout: SectionLayout,
  elements: readonly string[],
  direction: LoadDirection,
  endX: number,
): BlockShearLayout {
  const { section } = layout;
  for (const id of elements) {
    if (!section.elements.some((e) => e.id === id))
      throw new BlockShearError(`no element "${id}" in ${section.designation}`);
  }
  const holes = layout.holes.filter((h) => elements.includes(h.element));
  if (holes.length === 0) throw new BlockShearError(`elements ${elements.join(', ')} have no holes`);
  const eps = layout.tolerance;
  return {
    elements: section.elements.map((e) => {
      const at = section.junctions.flatMap((j) => j.attachments.filter((a) => a.element === e.id));
      const low = at.some((a) => Math.abs(a.u) <= eps);
      const high = at.some((a) => Math.abs(a.u - e.span) <= eps);
      const ends = (low ? 1 : 0) + (high ? 1 : 0);
      const extra = e.areaWidth - e.span;
      const share = ends === 0 ? extra / 2 : extra / ends;
      return {
        id: e.id,
        thickness: e.thickness,
        span: e.span,
        extendLow: low || ends === 0 ? share : 0,
        extendHigh: high || ends === 0 ? share : 0,
      };
    }),
    junctions: section.junctions.map((j) => ({
      id: j.id,
      attachments: j.attachments.map((a) => ({ element: a.element, u: a.u })),
    })),
    holes: holes.map((h) => ({ id: h.id, element: h.element, x: h.x, u: h.u, deducted: h.deducted })),
    pieces: section.pieces,
    direction,
    endX,
    tolerance: eps,
  };
}
