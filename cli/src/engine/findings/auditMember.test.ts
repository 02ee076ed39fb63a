import { describe, expect, it } from 'vitest';
import { auditMember } from './auditMember.js';
import type { CodeProfile, HoleInput, MemberInput } from '../types.js';
import type { CalcMember, MemberClaims } from './types.js';

const profile: CodeProfile = { standard: 'AISC 360-22', method: 'LRFD', units: 'in' };
const bolt = (id: string, x: number, y: number): HoleInput => ({
  id,
  x,
  y,
  boltDiameter: 0.75,
  type: 'standard',
});

// AISC Design Examples v13.0, Example D.9 (conformance/SOURCES.md R1), loaded from -x.
const d9: MemberInput = {
  id: 'SP-1',
  kind: 'splice-plate',
  width: 14,
  thickness: 0.5,
  material: { grade: 'A36', Fy: 36, Fu: 58 },
  directions: ['-x'],
  holes: [bolt('A1', 0, 2), bolt('B1', 2.5, 5), bolt('C1', 2.5, 9), bolt('D1', 0, 12)],
};

/** The published D.9 figures as a submitter would claim them (An 5.75, Ae 5.75; φPn 226.8 and 250.1 kip). */
const published: MemberClaims = {
  chains: [{ holes: ['A1', 'B1', 'C1', 'D1'], netWidth: 11.5, direction: '-x' }],
  controllingChain: { holes: ['A1', 'B1', 'C1', 'D1'], direction: '-x' },
  Ag: 7.0,
  An: 5.75,
  U: 1.0,
  Ae: 5.75,
  yielding: 226.8,
  rupture: 250.1,
  available: 226.8,
};

const audit = (claims: MemberClaims, input: MemberInput = d9, index = 0) =>
  auditMember({ index, input, claims } satisfies CalcMember, profile);
const codes = (claims: MemberClaims, input?: MemberInput) => audit(claims, input).findings.map((f) => f.code);

describe('auditMember', () => {
  it('accepts the published D.9 figures within the default 0.5 % (AISC Design Examples v13.0 D.9)', () => {
    const a = audit(published);
    expect(a).toMatchObject({ memberId: 'SP-1', pointer: '/members/0' });
    expect(a.findings).toEqual([]);
    expect(a.result.An).toBeCloseTo(5.7708, 4);
  });

  it('classifies a claimed An above the recomputed one as overstated (LG101, error) with the numbers in one line', () => {
    const [f] = audit({ An: 6.1 }).findings;
    expect(f).toEqual({
      code: 'LG101',
      name: 'overstated-net-area',
      class: 'overstated',
      severity: 'error',
      memberId: 'SP-1',
      claimed: 6.1,
      recomputed: expect.closeTo(5.7708, 4),
      message: 'Claimed An 6.100 in² exceeds the recomputed 5.771 in² (chain A1-B1-C1-D1, −x) by 5.7 %',
      pointer: '/members/0/claims/An',
    });
  });

  it('classifies claims below the recomputation as understated notes (LG111–LG115)', () => {
    const found = audit({
      Ag: 6.5,
      An: 5.0,
      U: 0.9,
      Ae: 5.0,
      yielding: 200,
      rupture: 200,
      available: 200,
    }).findings;
    expect(found.map((f) => [f.code, f.severity])).toEqual([
      ['LG115', 'note'],
      ['LG111', 'note'],
      ['LG114', 'note'],
      ['LG112', 'note'],
      ['LG113', 'note'],
      ['LG113', 'note'],
      ['LG113', 'note'],
    ]);
    expect(found.map((f) => f.pointer)).toContain('/members/0/claims/rupture');
  });

  it('flags overstated Ag, U, Ae and strengths (LG105, LG104, LG102, LG103)', () => {
    expect(codes({ Ag: 7.5, U: 1.1, Ae: 5.95, rupture: 260 })).toEqual(['LG105', 'LG104', 'LG102', 'LG103']);
  });

  it('honours an absolute tolerance per dimension', () => {
    const member: CalcMember = { index: 0, input: d9, claims: { An: 5.75 } };
    const strict = auditMember(member, profile, { tolerance: { relative: 0.005, absolute: { area: 0.01 } } });
    expect(strict.findings.map((f) => f.code)).toEqual(['LG111']);
  });

  it('reports the governing chain missing from the claimed chains (LG121): error when it is below the claimed An', () => {
    const found = audit({
      chains: [{ holes: ['A1', 'D1'], netWidth: 12.25, direction: '-x' }],
      An: 6.125,
    }).findings;
    const missed = found.find((f) => f.code === 'LG121')!;
    expect(missed).toMatchObject({
      severity: 'error',
      direction: '-x',
      chain: ['A1', 'B1', 'C1', 'D1'],
      pointer: '/members/0/claims/chains',
    });
    expect(missed.message).toMatch(
      /Governing chain A1-B1-C1-D1 for −x \(net width 11\.542 in, An 5\.771 in²\)/,
    );
  });

  it('makes the missed chain a warning when the claimed An is already at or below it', () => {
    const found = audit({ chains: [{ holes: ['A1', 'D1'], direction: '-x' }], An: 5.5 }).findings;
    expect(found.find((f) => f.code === 'LG121')?.severity).toBe('warning');
  });

  it('takes a claimed chain tying with the governing one as covering it (no LG121)', () => {
    // Holes 1.0 wide: A (0, 3), B (2, 5), C (0, 7) in a 10 × 1 plate from -x.
    // A–C: 10 − 2 = 8.0; A–B–C: 10 − 3 + 2 · 2²/(4·2) = 8.0. Either claim finds the least net width.
    const hole = (id: string, x: number, y: number): HoleInput => ({
      id,
      x,
      y,
      type: 'standard',
      dimension: { across: 0.9375, along: 0.9375 },
    });
    const tie: MemberInput = {
      ...d9,
      width: 10,
      thickness: 1,
      holes: [hole('A', 0, 3), hole('B', 2, 5), hole('C', 0, 7)],
    };
    expect(codes({ chains: [{ holes: ['A', 'C'] }] }, tie)).toEqual([]);
    expect(codes({ chains: [{ holes: ['A', 'B', 'C'] }] }, tie)).toEqual([]);
  });

  it('reports a claimed chain that cannot form for its direction (LG122): warning, error when it is the controlling claim', () => {
    const chain = { holes: ['A1', 'B1', 'C1'], netWidth: 11.9, direction: '-x' as const };
    const plain = audit({ chains: [published.chains![0]!, chain] }).findings;
    expect(plain).toEqual([
      expect.objectContaining({
        code: 'LG122',
        severity: 'warning',
        chain: ['A1', 'B1', 'C1'],
        pointer: '/members/0/claims/chains/1',
      }),
    ]);
    expect(plain[0]!.message).toMatch(/hole D1 lies on the loaded side of its fracture line for −x/);
    const controlling = audit({ chains: [chain], controllingChain: { holes: ['A1', 'B1', 'C1'] } }).findings;
    expect(controlling.find((f) => f.code === 'LG122')?.severity).toBe('error');
  });

  it('judges a claimed chain without direction against every member direction', () => {
    const chain = { holes: ['A1', 'B1', 'C1'] };
    expect(codes({ chains: [chain] })).toContain('LG122');
    expect(codes({ chains: [chain] }, { ...d9, directions: ['-x', '+x'] })).not.toContain('LG122');
  });

  it('reports a controlling chain that cannot form when it is not among the chains', () => {
    const found = audit({ controllingChain: { holes: ['B1', 'C1', 'D1'], direction: '-x' } }).findings;
    expect(found).toEqual([
      expect.objectContaining({
        code: 'LG122',
        severity: 'error',
        pointer: '/members/0/claims/controllingChain',
      }),
    ]);
  });

  it('reports a listed controlling chain that cannot form once, as an error, without also calling it LG125', () => {
    const found = audit({
      chains: [{ holes: ['A1', 'B1', 'C1'] }],
      controllingChain: { holes: ['A1', 'B1', 'C1'] },
    }).findings;
    expect(found.map((f) => [f.code, f.severity])).toEqual([
      ['LG121', 'error'],
      ['LG122', 'error'],
    ]);
  });

  it('reports claimed chains that do not exist (LG123) at the offending hole', () => {
    const found = audit({
      chains: [{ holes: ['A1', 'Z9'] }, { holes: ['C1', 'B1'] }, { holes: [] }],
    }).findings.filter((f) => f.code === 'LG123');
    expect(found.map((f) => f.pointer)).toEqual([
      '/members/0/claims/chains/0/holes/1',
      '/members/0/claims/chains/1/holes/1',
      '/members/0/claims/chains/2/holes',
    ]);
    expect(found.every((f) => f.severity === 'error')).toBe(true);
  });

  it('reports a chain on one gauge line as not existing', () => {
    const line: MemberInput = { ...d9, holes: [bolt('A1', 0, 2), bolt('A2', 3, 2), bolt('D1', 0, 12)] };
    expect(codes({ chains: [{ holes: ['A1', 'A2'] }] }, line)).toContain('LG123');
  });

  it('compares each claimed chain’s net width (LG124): error when larger, note when smaller', () => {
    const found = audit({
      chains: [
        { holes: ['A1', 'B1', 'C1', 'D1'], netWidth: 12.0, direction: '-x' },
        { holes: ['A1', 'D1'], netWidth: 12.0, direction: '-x' },
      ],
    }).findings.filter((f) => f.code === 'LG124');
    expect(found.map((f) => [f.severity, f.pointer])).toEqual([
      ['error', '/members/0/claims/chains/0/netWidth'],
      ['note', '/members/0/claims/chains/1/netWidth'],
    ]);
    expect(found[0]!.message).toBe(
      'Claimed net width 12.000 in of chain A1-B1-C1-D1 exceeds the recomputed 11.542 in by 4.0 %',
    );
  });

  it('warns when the claimed controlling chain is wider than the governing one (LG125)', () => {
    const found = audit({ controllingChain: { holes: ['A1', 'D1'], direction: '-x' } }).findings;
    expect(found).toEqual([
      expect.objectContaining({
        code: 'LG125',
        severity: 'warning',
        chain: ['A1', 'B1', 'C1', 'D1'],
        pointer: '/members/0/claims/controllingChain',
      }),
    ]);
  });

  it('warns when the equal-share check falls below the full-load An (LG131)', () => {
    // Ten bolts in two gauge lines (y = 3, 7) at x = 0 … 12, one more at (−3, 5) on the loaded side.
    const holes = [0, 3, 6, 9, 12].flatMap((x) => [bolt(`A${x}`, x, 3), bolt(`B${x}`, x, 7)]);
    const member: MemberInput = {
      ...d9,
      kind: 'plate',
      width: 10,
      thickness: 1,
      holes: [
        ...holes,
        { id: 'C', x: -3, y: 5, type: 'standard', dimension: { across: 0.9375, along: 0.9375 } },
      ],
    };
    // Hole widths 0.875 (bolts) and 1.0 (C): full-load An = 10 − 1 = 9.0 (C alone); A0-B0 8.25 × 11/10 = 9.075.
    const plain = audit({}, member).findings.filter((f) => f.code === 'LG131');
    expect(plain).toEqual([]);
    const wide: MemberInput = {
      ...member,
      holes: member.holes.map((h) =>
        h.id === 'C' ? { ...h, dimension: { across: 0.6875, along: 0.6875 } } : h,
      ),
    };
    // C deducts 0.75 now: full-load An 9.25; A0-B0 gives 8.25 × 11/10 = 9.075 < 9.25.
    const found = audit({}, wide).findings.filter((f) => f.code === 'LG131');
    expect(found).toEqual([
      expect.objectContaining({
        severity: 'warning',
        direction: '-x',
        chain: ['A0', 'B0'],
        pointer: '/members/0/holes',
      }),
    ]);
    expect(found[0]!.recomputed).toBeCloseTo(9.075, 10);
    expect(found[0]!.claimed).toBeCloseTo(9.25, 10);
    expect(found[0]!.message).toBe(
      'Equal-share check for −x: chain A0-B0 carries 10 of 11 fasteners; An/share 9.075 in² is below the full-load An 9.250 in²',
    );
  });

  it('reports layout input problems as input findings first, with member pointers', () => {
    const dup: MemberInput = { ...d9, holes: [bolt('A1', 0, 2), bolt('A1', 0, 12)] };
    const found = audit({ An: 6.5 }, dup, 3).findings;
    expect(found[0]).toMatchObject({ code: 'LG303', class: 'input', pointer: '/members/3/holes/1/id' });
  });

  it('adds detailing findings with member pointers', () => {
    const tight: MemberInput = { ...d9, holes: [bolt('A1', 0, 0.9), bolt('D1', 0, 12)] };
    expect(audit({}, tight).findings).toEqual([
      expect.objectContaining({ code: 'LG202', pointer: '/members/0/holes/0/y' }),
    ]);
  });

  it('audits a member without holes or claims to no findings', () => {
    expect(audit({}, { ...d9, holes: [] }).findings).toEqual([]);
  });
});
