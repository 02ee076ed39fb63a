import type { SectionLayout } from '../sections/types.js';
import type { LoadDirection } from '../types.js';
import { BlockShearError } from './blockShearError.js';
import type { BlockShearLayout } from './types.js';

/**
 * The block shear layouts of one connected element of an unfolded section (../sections), so a
 * member's bolt group goes straight to {@link blockOutlines}. y is the position along the element's
 * centreline; an edge where another element is attached is not free (an angle's heel side, a channel
 * web's ends). A flange with the web at its middle is split there into two halves, each torn out
 * toward its own tip: the web stops a block from crossing it.
 *
 * @param layout - the unfolded section
 * @param element - id of the connected element
 * @param direction - load direction (the block tears toward the loaded end)
 * @param endX - x of the member's loaded end
 * @returns one layout, or two for a flange split at the web; holes keep their deducted widths
 * @throws BlockShearError when the element is unknown or has no holes
 * @example
 * // 2L6x6x5/8 with 9 bolts in leg a (R6): one layout, the toe free, the heel not
 * sectionBlockLayouts(twoL6x6Layout, 'leg-a', '-x', 0)[0]?.freeEdges // → { low: false, high: true }
 */
export function sectionBlockLayouts(
  layout: SectionLayout,
  element: string,
  direction: LoadDirection,
  endX: number,
): BlockShearLayout[] {
  const e = layout.section.elements.find((el) => el.id === element);
  if (!e) throw new BlockShearError(`no element "${element}" in ${layout.section.designation}`);
  const holes = layout.holes.filter((h) => h.element === element);
  if (holes.length === 0) throw new BlockShearError(`element "${element}" has no holes`);
  const stations = layout.section.junctions.flatMap((j) =>
    j.attachments.filter((t) => t.element === element).map((t) => t.u),
  );
  const eps = layout.tolerance;
  const base = { thickness: e.thickness, pieces: layout.section.pieces, direction, endX };
  const inner = stations.filter((u) => u > eps && u < e.span - eps);
  if (inner.length > 1)
    throw new BlockShearError(`element "${element}" has more than one junction inside it`);
  if (inner.length === 0) {
    return [
      {
        ...base,
        width: e.span,
        holes: holes.map((h) => ({ id: h.id, x: h.x, y: h.u, deducted: h.deducted })),
        freeEdges: { low: !stations.some((u) => u <= eps), high: !stations.some((u) => u >= e.span - eps) },
      },
    ];
  }
  const mid = inner[0]!;
  const low = holes.filter((h) => h.u < mid);
  const high = holes.filter((h) => h.u > mid);
  const out: BlockShearLayout[] = [];
  if (low.length > 0) {
    out.push({
      ...base,
      width: mid,
      holes: low.map((h) => ({ id: h.id, x: h.x, y: h.u, deducted: h.deducted })),
      freeEdges: { low: true, high: false },
    });
  }
  if (high.length > 0) {
    out.push({
      ...base,
      width: e.span - mid,
      holes: high.map((h) => ({ id: h.id, x: h.x, y: h.u - mid, deducted: h.deducted })),
      freeEdges: { low: false, high: true },
    });
  }
  return out;
}
