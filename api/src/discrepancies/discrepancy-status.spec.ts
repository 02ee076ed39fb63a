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
  // reopen: accepted or waived back to the consultant as returned
  ['accepted', 'returned', Role.Checker],
  ['waived', 'returned', Role.Checker],
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

  it('asks a reopen for a note, and makes it one at a time (never in a bulk move)', () => {
    expect(refusal({ status: 'accepted' }, { to: 'returned' }, Role.Checker)?.message).toMatch(/Reopening/);
    expect(refusal({ status: 'waived' }, { to: 'returned', note: 'again' }, Role.Checker)).toBeNull();
    expect(
      refusal({ status: 'waived' }, { to: 'returned', note: 'again' }, Role.Checker, { bulk: true }),
    ).toMatchObject({ status: 409, message: expect.stringMatching(/one at a time/) });
    expect(
      refusal({ status: 'answered' }, { to: 'returned', note: 'r' }, Role.Checker, { bulk: true }),
    ).toBeNull();
  });

  it('refuses every move on a superseded item, and any move out of resolved', () => {
    const superseded = { status: 'raised' as const, supersededBySubmittalId: 4 };
    expect(refusal(superseded, { to: 'waived', note: 'n' }, Role.Checker)).toMatchObject({
      status: 409,
      message: expect.stringMatching(/superseded by submittal #4/),
    });
    for (const to of TARGETS)
      for (const role of [Role.Checker, Role.Consultant])
        expect(refusal({ status: 'resolved' }, { to, note: 'n' }, role)?.status).toBeGreaterThanOrEqual(403);
  });
});
