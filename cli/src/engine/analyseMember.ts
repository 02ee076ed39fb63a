import { analyseModel } from './analyseModel.js';
import { memberModel } from './member/memberModel.js';
import type { AnalyseOptions, CodeProfile, MemberInput, MemberResult } from './types.js';

/**
 * Net section and tensile strength of a member for each load direction: builds the member
 * ({@link memberModel}: hole widths, the plate layout or the unfolded section) and analyses it
 * ({@link analyseModel}). Members with a `section` (angles, tees, W-shapes, channels) are searched as
 * connected flat elements (cli/src/engine/sections/README.md); Ag is then the tabulated value when
 * given. Under EN 1993-1-1 and CSA S16-19 hole widths, net area rule and strengths come from the
 * code's profile; the 0.85 Ag cap is AISC 360 J4.1's and applies only there.
 *
 * @param member - the member (width, thickness, material, holes, directions, U, required strength)
 * @param profile - code edition, design method and unit system
 * @param options - k least chains per direction (default 10); directions (default the member's)
 * @returns the result
 * @throws EngineError when a hole's bolt size is not in the hole table, width or thickness is not
 *   positive, or a direction's least chain leaves a net area ≤ 0 (the loader reports that as the rule
 *   net-area-positive with the file and pointer)
 * @example
 * // AISC Design Examples v13.0 D.9: 14 × 1/2 plate, A36, four 3/4 in bolts, loaded from -x
 * const r = analyseMember(d9Member, { standard: 'AISC 360-22', method: 'LRFD', units: 'in' });
 * r.An // → 5.7708 (published 5.75 in², from 11.5 in × 1/2)
 * r.Ae // → 5.7708 (U = 1.0, Table D3.1 case 1; below 0.85 Ag = 5.95)
 */
export function analyseMember(
  member: MemberInput,
  profile: CodeProfile,
  options: AnalyseOptions = {},
): MemberResult {
  return analyseModel(memberModel(member, profile), options);
}
