import { auditMember } from './auditMember.js';
import { ENGINE_VERSION } from '../engineVersion.js';
import type { AuditedCalc, AuditOptions, CalcAudit } from './types.js';

/**
 * Audits every member of a calc (see {@link auditMember}) under the calc's profile.
 *
 * @param doc - the calc's profile and members (a normalised CalcDocument)
 * @param options - tolerance (default 0.5 % relative), k least chains (10), directions
 * @returns the engine version, the profile and one audit per member, in file order
 * @throws EngineError when a hole's bolt size is not in the hole table (the loader rejects such files)
 * @example
 * auditCalc(doc).members[0]?.pointer // → '/members/0'
 */
export function auditCalc(doc: AuditedCalc, options: AuditOptions = {}): CalcAudit {
  return {
    engineVersion: ENGINE_VERSION,
    profile: doc.profile,
    members: doc.members.map((member) => auditMember(member, doc.profile, options)),
  };
}
