import type { MemberModel, MemberResult } from '../types.js';
import { detailingFindings } from './detailingFindings.js';
import { grazingFindings } from './grazingFindings.js';
import { profileDetailingFindings } from './profileDetailingFindings.js';
import { sectionDetailingFindings } from './sectionDetailingFindings.js';
import type { Finding } from './types.js';

/**
 * The detailing a checker also looks at (cli/docs/method.md §7), by the member's code and form: EN
 * 1993-1-8 Table 3.3 and CSA S16 22.3 per element ({@link profileDetailingFindings}); under AISC 360,
 * J3.3 spacing and J3.4 edge distance within each element of a rolled shape
 * ({@link sectionDetailingFindings}) or across a plate ({@link detailingFindings}); then, under every
 * code, a governing fracture line grazing a hole it does not deduct ({@link grazingFindings}, LG203),
 * which is geometry rather than a code rule.
 *
 * @param model - the member model
 * @param result - its analysis (the governing chains, for grazing)
 * @param memberPointer - the member's JSON pointer
 * @returns the code's detailing findings, then the grazing ones
 * @example
 * // two 3/4 in bolts 1.75 in apart in a plate: 2-2/3 · 0.75 = 2.00 in
 * memberDetailingFindings(model, result, '/members/0')[0]?.code // → 'LG201'
 */
export function memberDetailingFindings(
  model: MemberModel,
  result: MemberResult,
  memberPointer: string,
): Finding[] {
  const standard = model.profile.standard;
  const byCode =
    standard === 'EN 1993-1-1' || standard === 'CSA S16-19'
      ? profileDetailingFindings(model, memberPointer)
      : model.unfolded
        ? sectionDetailingFindings(model, memberPointer)
        : detailingFindings(model, memberPointer);
  return [...byCode, ...grazingFindings(model, result, memberPointer)];
}
