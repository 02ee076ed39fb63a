import { analyseModel } from '../analyseModel.js';
import { memberModel } from '../member/memberModel.js';
import type { CodeProfile } from '../types.js';
import { blockShearFindings } from './blockShearFindings.js';
import { claimedChainFindings } from './claimedChainFindings.js';
import { claimedValueFindings } from './claimedValueFindings.js';
import { equalShareFindings } from './equalShareFindings.js';
import { layoutFindings } from './layoutFindings.js';
import { memberDetailingFindings } from './memberDetailingFindings.js';
import { missedChainFindings } from './missedChainFindings.js';
import { orderFindings } from './orderFindings.js';
import { resultBasisFindings } from './resultBasisFindings.js';
import { DEFAULT_TOLERANCE } from './withinTolerance.js';
import type { AuditOptions, AuditScope, CalcMember, MemberAudit } from './types.js';

/**
 * Audits one member of a calc file: recomputes it from its input (never trusting a claim) and
 * compares every claimed number, classifying each difference by what it means for safety
 * (cli/docs/method.md §8, codes in FINDING_CATALOGUE): overstated claims (LG101–LG105, errors),
 * understated ones (LG111–LG115, notes), claimed chains that do not exist (LG123) or cannot form
 * (LG122), claimed net widths that differ (LG124), a governing chain missing from the claimed chains
 * (LG121) or a controlling chain that is not the governing one (LG125), the equal-share rule
 * (LG131), block shear below the tensile strengths unclaimed (LG132), a tabulated Ag or a shear lag
 * factor the file should have said otherwise (LG141, LG142), detailing (LG201–LG206) and layout input
 * problems (LG301–LG303). The member is built once ({@link memberModel}) and every part takes it.
 *
 * @param calcMember - the member as read from the calc file, with its claims and index
 * @param profile - code edition, method and units of the file
 * @param options - tolerance (default 0.5 % relative), k least chains (10), directions
 * @returns the result and the findings, ordered input, overstated, missed, phantom, chain width,
 *   equal share, understated, detailing
 * @throws EngineError when a hole's bolt size is not in the hole table (the loader rejects such files)
 * @example
 * // D.9 claimed with An 6.10 in² and only the straight chain: LG101 and LG121
 * auditMember(member, profile).findings.map((f) => f.code) // → ['LG101', 'LG121', …]
 */
export function auditMember(
  calcMember: CalcMember,
  profile: CodeProfile,
  options: AuditOptions = {},
): MemberAudit {
  const member = calcMember.input;
  const scope: AuditScope = {
    memberId: member.id,
    pointer: `/members/${calcMember.index}`,
    units: profile.units,
    tolerance: options.tolerance ?? DEFAULT_TOLERANCE,
  };
  const model = memberModel(member, profile);
  const result = analyseModel(model, {
    k: options.k ?? 10,
    ...(options.directions ? { directions: options.directions } : {}),
  });
  const claims = calcMember.claims ?? {};
  const chains = claimedChainFindings(model, result, claims, scope);
  const findings = [
    ...layoutFindings(model, scope),
    ...claimedValueFindings(result, claims, scope),
    ...chains.findings,
    ...missedChainFindings(result, claims, chains.admissible, member.thickness, scope),
    ...equalShareFindings(result, scope),
    ...blockShearFindings(result, claims, scope),
    ...resultBasisFindings(model, result, scope),
    ...memberDetailingFindings(model, result, scope.pointer),
  ];
  return { memberId: member.id, pointer: scope.pointer, result, findings: orderFindings(findings) };
}
