import { SectionError } from './sectionError.js';
import type { Section, SectionGrossArea } from './types.js';

/**
 * Gross area of a section: Σ areaWidth × thickness × pieces from the elements (AISC 360 B4.3a: the
 * sum of the products of thickness and gross width of each element), or the tabulated value when one
 * is given. A tabulated value wins, and the difference (tabulated − elements; positive for rolled
 * shapes, whose fillets the flat elements leave out) is reported.
 *
 * @param section - the section
 * @param tabulated - Ag from a section table, if the calc file gives one
 * @returns the two values, the one used and their difference
 * @throws SectionError ('invalid-argument') when tabulated is given and not positive
 * @example
 * sectionGrossArea(angle(6, 6, 0.625, { pieces: 2 }), 14.26)
 * // → { fromElements: 14.21875, tabulated: 14.26, used: 14.26, difference: 0.04125 }
 */
export function sectionGrossArea(section: Section, tabulated?: number): SectionGrossArea {
  let fromElements = 0;
  for (const e of section.elements) fromElements += e.areaWidth * e.thickness;
  fromElements *= section.pieces;
  if (tabulated === undefined) return { fromElements, used: fromElements };
  if (!(Number.isFinite(tabulated) && tabulated > 0)) {
    throw new SectionError('invalid-argument', `tabulated Ag must be positive, got ${tabulated}`);
  }
  return { fromElements, tabulated, used: tabulated, difference: tabulated - fromElements };
}
