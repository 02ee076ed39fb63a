import type { Section } from '../engine/sections/types.js';
import type { HoleInput } from '../engine/types.js';
import type { SemanticIssue } from './normaliseTypes.js';

/**
 * Places a rolled shape's holes in its unfolded drawing (cli/src/engine/sections/README.md §7):
 * each hole at y = unfoldOffset ± u, u = datum + gauge, measured from the unfolded section's lowest
 * edge; the member's width is then the unfolded width and its thickness the first element's. A hole
 * naming an element the section lacks, or a gauge that puts it outside its element, is the rule
 * hole-outside-element (LG304) and keeps its y.
 *
 * @param built - the section
 * @param holes - the member's holes (element and gauge given)
 * @param pointer - the member's JSON pointer
 * @param issues - where the problems go
 * @returns the holes with their unfolded y, the unfolded width and the thickness
 * @example
 * // L4x4x1/2, a hole 2.5 in from the heel in leg a: u = 2.5 − 0.25, y from leg a's toe 4 − 0.25 − 2.25
 * placeSectionHoles(angle(4, 4, 0.5), [{ id: 'A', x: 0, y: NaN, element: 'leg-a', gauge: 2.5, type: 'standard' }], '/members/0', [])
 * // → { holes: [{ …, y: 1.5 }], width: 7.5, thickness: 0.5 }
 */
export function placeSectionHoles(
  built: Section,
  holes: readonly HoleInput[],
  pointer: string,
  issues: SemanticIssue[],
): { readonly holes: HoleInput[]; readonly width: number; readonly thickness: number } {
  const mp = pointer;
  let lo = Number.POSITIVE_INFINITY;
  let hi = Number.NEGATIVE_INFINITY;
  for (const e of built.elements) {
    for (const y of [e.unfoldOffset, e.unfoldOffset + e.unfoldSense * e.span]) {
      lo = Math.min(lo, y);
      hi = Math.max(hi, y);
    }
  }
  const placed = holes.map((hole, index) => {
    const hp = `${mp}/holes/${index}`;
    const e = built.elements.find((el) => el.id === hole.element);
    if (!e) {
      issues.push({
        pointer: `${hp}/element`,
        rule: 'hole-outside-element',
        message: `${hp}/element: ${built.designation} has no element "${hole.element}"; its elements are ${built.elements.map((el) => el.id).join(', ')} (rule hole-outside-element)`,
      });
      return hole;
    }
    const u = e.datum + (hole.gauge ?? Number.NaN);
    if (!Number.isFinite(u)) return hole;
    if (!(u > 0 && u < e.span)) {
      issues.push({
        pointer: `${hp}/gauge`,
        rule: 'hole-outside-element',
        message: `${hp}/gauge: gauge ${hole.gauge} from the ${e.gaugeFrom} puts hole ${hole.id} outside ${e.id} of ${built.designation} (rule hole-outside-element)`,
      });
      return hole;
    }
    return { ...hole, y: e.unfoldOffset + e.unfoldSense * u - lo };
  });
  return { holes: placed, width: hi - lo, thickness: built.elements[0]!.thickness };
}
