import { inspectLayout } from '../holes/inspectLayout.js';
import type { MemberModel } from '../types.js';
import { makeFinding } from './makeFinding.js';
import type { AuditScope, Finding } from './types.js';

/**
 * Problems of a member's hole layout that reach the audit (cli/docs/method.md §7): holes outside the
 * plate (LG301), overlapping holes (LG302) and repeated hole ids (LG303), from {@link inspectLayout}.
 * A section's holes are placed by element and gauge, and the loader reports those outside their
 * element (LG304), so on a section member only LG303 is raised here.
 *
 * @param model - the member model
 * @param scope - the member's id and JSON pointer
 * @returns the findings, in hole order
 * @example
 * // a 3/4 in bolt at y = 0.3 in a 14 in plate: its 13/16 in hole reaches past the edge y = 0
 * layoutFindings(model, scope)[0]?.pointer // → '/members/0/holes/0'
 */
export function layoutFindings(model: MemberModel, scope: AuditScope): Finding[] {
  const member = model.input;
  return inspectLayout(member, model.profile)
    .filter((i) => !member.section || i.code === 'LG303')
    .map((issue) =>
      makeFinding(issue.code, {
        memberId: scope.memberId,
        holes: issue.holes,
        message: issue.message,
        pointer: scope.pointer + issue.pointer,
      }),
    );
}
