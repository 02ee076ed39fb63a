import { Role } from '../auth/role.enum.js';
import { refusal } from './discrepancies.service.js';
import { DISCREPANCY_STATUSES, type DiscrepancyStatus } from './discrepancy-status.js';

/** The status flow of api/README.md, as a table: [from, to, role] → allowed. */
const ALLOWED: [DiscrepancyStatus, DiscrepancyStatus, Role][] = [
  ['raised', 'answered', Role.Consultant],
  ['returned', 'answered', Role.Consultant],
  ['answered', 'accepted', Role.Checker],
  ['answered', 'returned', Role.Checker],
  ['raised', 'waived', Role.Checker],
  ['answered', 'waived', Role.Checker],
  ['returned', 'waived', Role.Checker],
];
const TARGETS: DiscrepancyStatus[] = ['answered', 'accepted', 'returned', 'waived'];
const ROLES = [Role.Admin, Role.Consultant, Role.Checker, Role.OwnerRep];

describe('refusal (the discrepancy status flow)', () => {
  const cases = DISCREPANCY_STATUSES.flatMap((from) =>
    TARGETS.flatMap((to) => ROLES.map((role) => [from, to, role] as const)),
  );

  it.each(cases)('%s → %s by %s', (from, to, role) => {
    const r = refusal({ status: from }, { to, note: 'a note' }, role);
    const allowed = ALLOWED.some(([f, t, ro]) => f === from && t === to && ro === role);
    if (allowed) expect(r).toBeNull();
    else {
      const roleMayEver = ALLOWED.some(([, t, ro]) => t === to && ro === role);
      expect(r?.status).toBe(roleMayEver ? 409 : 403);
    }
  });

  it('asks an answer for a note or a revision, and a return or waiver for a reason', () => {
    expect(refusal({ status: 'raised' }, { to: 'answered' }, Role.Consultant)?.status).toBe(400);
    expect(
      refusal({ status: 'raised' }, { to: 'answered', revisionSubmittalId: 7 }, Role.Consultant),
    ).toBeNull();
    expect(refusal({ status: 'answered' }, { to: 'returned' }, Role.Checker)?.status).toBe(400);
    expect(refusal({ status: 'raised' }, { to: 'waived' }, Role.Checker)?.status).toBe(400);
    expect(refusal({ status: 'answered' }, { to: 'accepted' }, Role.Checker)).toBeNull();
  });
});
