import { EngineError } from '../engineError.js';
import { memberHoleWidth } from '../holes/memberHoleWidth.js';
import { sectionGrossArea } from '../sections/sectionGrossArea.js';
import { unfold } from '../sections/unfold.js';
import type { CodeProfile, MemberInput, MemberModel } from '../types.js';
import { memberLayout } from './memberLayout.js';
import { memberSection } from './memberSection.js';

/**
 * Builds a member once for everything that looks at it: the width each hole deducts under the file's
 * code ({@link memberHoleWidth}), then for a plate the hole layout the chain searches work on
 * ({@link memberLayout}), or for a rolled shape its flat-element section ({@link memberSection})
 * unfolded with its holes ({@link unfold}, cli/src/engine/sections/README.md) and its gross area
 * (the tabulated Ag when given). The analysis, the claimed-chain tools and the grazing and detailing
 * findings all take the model.
 *
 * @param member - the member as the engine sees it
 * @param profile - the file's code profile
 * @returns the model
 * @throws EngineError when a hole's bolt size is not in the code's table, or a section member's hole
 *   has no element or gauge; SectionError when a section dimension or a hole's place in it is invalid
 * @example
 * // AISC Design Examples v13.0 D.9: 3/4 in bolts deduct 13/16 + 1/16 = 0.875 in
 * memberModel(d9Member, { standard: 'AISC 360-22', method: 'LRFD', units: 'in' }).layout?.holes[0]?.deducted // → 0.875
 * // L4x4x1/2, holes 2.5 in from the heel in each leg: gauge across the heel 2.5 + 2.5 − 0.5
 * memberModel(angleMember, aisc).unfolded?.gauges[0]?.[1] // → 4.5
 */
export function memberModel(member: MemberInput, profile: CodeProfile): MemberModel {
  const holeWidths = member.holes.map((h) => memberHoleWidth(h, profile));
  const spec = member.section;
  if (!spec) return { input: member, profile, holeWidths, layout: memberLayout(member, profile, holeWidths) };
  const section = memberSection(spec);
  const holes = member.holes.map((h, i) => {
    if (h.element === undefined || h.gauge === undefined) {
      throw new EngineError(
        'invalid-argument',
        `hole ${h.id}: a section member's holes need element and gauge`,
      );
    }
    return { id: h.id, element: h.element, x: h.x, gauge: h.gauge, deducted: holeWidths[i]!.deducted };
  });
  const tabulated = spec.tabulatedAg !== undefined ? { tabulatedAg: spec.tabulatedAg } : {};
  return {
    input: member,
    profile,
    holeWidths,
    unfolded: unfold(section, holes, tabulated),
    grossArea: sectionGrossArea(section, spec.tabulatedAg),
  };
}
