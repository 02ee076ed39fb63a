import type { UnitSystem } from '../engine/types.js';
import { calcReaders } from './calcReaders.js';
import { normaliseMember } from './normaliseMember.js';
import { normaliseMeta } from './normaliseMeta.js';
import { normaliseProfile } from './normaliseProfile.js';
import type { Raw, SemanticIssue } from './normaliseTypes.js';
import type { CalcDocument, CalcMember } from './types.js';

/**
 * Reads a schema-valid calc file into a CalcDocument: lengths to numbers, bolt sizes to diameters,
 * explicit hole sizes to {across, along} ({@link calcReaders}, {@link normaliseMember}), the meta
 * ({@link normaliseMeta}) and the code profile ({@link normaliseProfile}). Collects every rule the
 * schema cannot express, in file order (members first, then the code), so one run reports them all.
 *
 * @param raw - the parsed file, already valid against the calc schema
 * @returns the document and the semantic issues found
 * @example
 * normaliseDocument(JSON.parse(northSpliceText)).issues // → []
 */
export function normaliseDocument(raw: Raw): { document: CalcDocument; issues: SemanticIssue[] } {
  const units = raw['units'] as UnitSystem;
  const read = calcReaders(units);
  const issues = read.issues;
  const seenMembers = new Map<string, number>();
  const members: CalcMember[] = (raw['members'] as Raw[]).map((m, index) => {
    const id = m['id'] as string;
    const first = seenMembers.get(id);
    if (first !== undefined) {
      issues.push({
        pointer: `/members/${index}/id`,
        rule: 'duplicate-member-id',
        message: `/members/${index}/id: member id ${JSON.stringify(id)} is already used by /members/${first} (rule duplicate-member-id)`,
      });
    } else {
      seenMembers.set(id, index);
    }
    return normaliseMember(m, index, read);
  });
  const meta = normaliseMeta(raw['meta'] as Raw);
  const profile = normaliseProfile(raw['code'] as Raw, units, issues);
  const document: CalcDocument = {
    format: 'ligament-calc',
    formatVersion: raw['formatVersion'] as string,
    meta,
    profile,
    members,
  };
  return { document, issues };
}
