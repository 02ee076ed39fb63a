import { leastChains } from '../engine/chains/leastChains.js';
import { formatDirection } from '../engine/findings/formatDirection.js';
import { formatQuantity } from '../engine/findings/formatQuantity.js';
import { memberModel } from '../engine/member/memberModel.js';
import { sectionDirections } from '../engine/sections/sectionDirections.js';
import type { CodeProfile, MemberInput } from '../engine/types.js';

/** A member whose least net section is not positive, as the loader reports it. */
export interface NetAreaIssue {
  /** JSON pointer suffix relative to the member (`/holes`). */
  readonly pointer: string;
  readonly rule: 'net-area-positive';
  readonly message: string;
}

/**
 * The rule net-area-positive: a member's least admissible chain (per load direction) must leave a
 * net width and a net area above zero. A chain whose holes (with their damage allowance, less the
 * s²/4g credits) take the whole width describes a plate that is cut apart, not a tension member:
 * the file is invalid, never a negative strength. Uses the same least-chain search as the audit
 * (k = 1). Run after the hole sizes and layout are known to be valid.
 *
 * @param member - the member, with its hole sizes known
 * @param profile - code edition and units of the file
 * @returns the issue, or null when every direction's least chain leaves a positive net area
 * @example
 * // 2 in plate, two 3/4 in bolts side by side at y 0.5 and 1.5: 2 − 2 · 0.875 = 0.25 in, fine
 * netAreaIssues(member, profile) // → null
 */
export function netAreaIssues(member: MemberInput, profile: CodeProfile): NetAreaIssue | null {
  if (member.holes.length === 0) return null;
  const u = profile.units;
  const model = memberModel(member, profile);
  if (model.unfolded) {
    for (const d of sectionDirections(model.unfolded, member.directions, 1)) {
      const c = d.governing;
      if (!c || c.netArea > 0) continue;
      return {
        pointer: '/holes',
        rule: 'net-area-positive',
        message: `chain ${c.holes.join('-')} loaded from ${formatDirection(d.direction)} leaves a net area of ${formatQuantity(c.netArea, 'area', u)} (Ag ${formatQuantity(model.grossArea.used, 'area', u)} − holes ${formatQuantity(c.deductedArea, 'area', u)} + s²/4g ${formatQuantity(c.staggerArea, 'area', u)}); the holes take the whole section, so it is not a tension member`,
      };
    }
    return null;
  }
  for (const direction of member.directions) {
    const c = leastChains(model.layout, direction, 1)[0];
    if (!c || (c.netWidth > 0 && c.netArea > 0)) continue;
    return {
      pointer: '/holes',
      rule: 'net-area-positive',
      message: `chain ${c.holes.join('-')} loaded from ${formatDirection(direction)} leaves a net width of ${formatQuantity(c.netWidth, 'length', u)} (width ${formatQuantity(member.width, 'length', u)} − holes ${formatQuantity(c.deducted, 'length', u)} + s²/4g ${formatQuantity(c.staggerSum, 'length', u)}); the holes take the whole width, so it is not a tension member`,
    };
  }
  return null;
}
