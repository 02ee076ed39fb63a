import { holeWidth } from '../holes/holeWidth.js';
import type { CodeProfile, HoleLayout, HoleWidth, MemberInput } from '../types.js';

/**
 * The layout the chain searches work on: the member's width and thickness and each hole with the
 * width it deducts (AISC 360 Table J3.3/J3.3M plus the B4.3b allowance, see {@link holeWidth}).
 *
 * @param member - the member
 * @param profile - code edition and unit system
 * @param widths - the hole widths, if already computed (one per hole, same order)
 * @returns the layout
 * @throws EngineError when a hole's bolt size is not in the hole table
 * @example
 * // D.9: 3/4 in bolts in standard holes deduct 13/16 + 1/16 = 0.875 in each
 * memberLayout(d9Member, { standard: 'AISC 360-22', method: 'LRFD', units: 'in' }).holes[0]?.deducted // → 0.875
 */
export function memberLayout(
  member: MemberInput,
  profile: CodeProfile,
  widths: readonly HoleWidth[] = member.holes.map((h) => holeWidth(h, profile)),
): HoleLayout {
  return {
    width: member.width,
    thickness: member.thickness,
    holes: member.holes.map((h, index) => ({
      id: h.id,
      index,
      x: h.x,
      y: h.y,
      deducted: widths[index]!.deducted,
    })),
  };
}
