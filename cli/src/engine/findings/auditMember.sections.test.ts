import { describe, expect, it } from 'vitest';
import { auditMember } from './auditMember.js';
import { braceMember, legHole } from '../members.fixtures.js';
import type { CodeProfile, MemberInput } from '../types.js';
import type { CalcMember, MemberClaims } from './types.js';

const AISC: CodeProfile = { standard: 'AISC 360-22', method: 'LRFD', units: 'in' };
const EN: CodeProfile = { standard: 'EN 1993-1-1', method: 'LRFD', units: 'mm' };
const CSA: CodeProfile = { standard: 'CSA S16-19', method: 'LRFD', units: 'mm' };

// L4x4x3/8 brace, four 3/4 in bolts at 3 in (the Harbour Lantern example lantern-brace-angle.json).
const brace = braceMember;
const audit = (input: MemberInput, profile: CodeProfile, claims?: MemberClaims) =>
  auditMember({ index: 0, input, ...(claims ? { claims } : {}) } as CalcMember, profile);
const codes = (a: ReturnType<typeof audit>) => a.findings.map((f) => f.code);

describe('auditMember: block shear, sections and the EN / CSA profiles', () => {
  // Block shear by hand (AISC 360 J4.3, one plane to the toe): Agv 10.5·0.375 = 3.9375,
  // Anv (10.5 − 3.5·0.875)·0.375 = 2.7891, Ant (1.5 − 0.4375)·0.375 = 0.3984 in²;
  // φRn = 0.75 [min(0.6·58·2.7891, 0.6·36·3.9375) + 58·0.3984] = 81.12 kips (common practice).
  it('LG106 / LG107 for overstated block shear claims, LG116 / LG117 for understated ones', () => {
    const over = audit(brace, AISC, { blockShear: 95, Agv: 4.5, available: 81.1 });
    expect(codes(over)).toEqual(['LG107', 'LG106']);
    expect(over.findings[1]!.pointer).toBe('/members/0/claims/blockShear');
    expect(over.findings[1]!.recomputed).toBeCloseTo(81.1195, 3);
    const under = audit(brace, AISC, { blockShear: 70, Ant: 0.3, available: 70 });
    expect(codes(under)).toEqual(expect.arrayContaining(['LG117', 'LG116', 'LG113']));
  });

  it('compares claimed block shear areas with the outline they describe, the strength with the governing one', () => {
    // By hand (common practice): the block through the heel and the whole other leg, one shear plane
    // along the bolts: Agt (2.5 + 3.625)·0.375 = 2.2969, Ant 2.2969 − 0.4375·0.375 = 2.1328 in²;
    // φRn = 0.75 [min(97.06, 85.05) + 58·2.1328] = 156.6 kips, above the governing 81.12 kips.
    const a = audit(brace, AISC, { Agv: 3.9375, Anv: 2.789, Agt: 2.297, Ant: 2.133, blockShear: 156.6 });
    expect(codes(a)).not.toContain('LG107');
    expect(codes(a)).toContain('LG106');
    expect(a.findings.find((f) => f.code === 'LG106')!.recomputed).toBeCloseTo(81.1195, 3);
    // The governing outline's own areas, one of them off: LG107 against that outline.
    const b = audit(brace, AISC, { Agv: 3.9375, Agt: 0.5625, Ant: 0.45 });
    expect(codes(b).filter((c) => c === 'LG107')).toHaveLength(1);
    expect(b.findings.find((f) => f.code === 'LG107')!.message).toContain('outline to-edge');
  });

  it('a correct claim governed by block shear is no finding (the governing strength includes it)', () => {
    expect(codes(audit(brace, AISC, { available: 81.12, blockShear: 81.12 }))).toEqual([]);
  });

  it('LG132 when block shear is below the tensile strengths and nothing claimed allows for it', () => {
    const a = audit(brace, AISC, { An: 2.532 });
    expect(codes(a)).toContain('LG132');
    expect(a.findings.find((f) => f.code === 'LG132')!.severity).toBe('warning');
    // A claimed available strength is compared with the lesser of tension and block shear instead.
    const b = audit(brace, AISC, { available: 92.7 });
    expect(codes(b)).toEqual(['LG103']);
    expect(b.findings[0]!.message).toContain('block shear governs');
  });

  it('LG141 when the tabulated Ag differs from the elements beyond tolerance, LG142 without shear lag data', () => {
    const { shearLag, ...noLag } = brace;
    void shearLag;
    const a = audit({ ...noLag, section: { ...brace.section!, tabulatedAg: 2.95 } }, AISC, {
      available: 81.12,
    });
    expect(codes(a)).toEqual(['LG141', 'LG142']);
    expect(a.findings[0]!.pointer).toBe('/members/0/section/Ag');
    expect(a.findings[1]!.pointer).toBe('/members/0/load');
  });

  it('checks claimed section chains on the unfolded section (LG123 for an unknown hole, LG122 for one that cannot form)', () => {
    const a = audit(brace, AISC, {
      available: 81.1,
      chains: [{ holes: ['A9'] }, { holes: ['A2'], direction: '-x' }],
    });
    expect(codes(a)).toEqual(['LG121', 'LG123', 'LG122']);
  });

  it('LG201 / LG202 within an element: spacing below 2-2/3 d, toe distance below Table J3.4 (the heel has no edge)', () => {
    const tight = { ...brace, holes: [legHole('A1', 0, 3.4), legHole('A2', 1.5, 3.4)] };
    const a = audit(tight, AISC, { available: 50 });
    expect(codes(a)).toEqual(expect.arrayContaining(['LG201', 'LG202']));
    expect(a.findings.find((f) => f.code === 'LG202')!.pointer).toBe('/members/0/holes/0/gauge');
  });

  it('LG204 / LG205 under EN 1993-1-8 Table 3.3 and LG206 under CSA S16 22.3.1', () => {
    const plate: MemberInput = {
      id: 'P',
      kind: 'plate',
      width: 200,
      thickness: 10,
      material: { Fy: 355, Fu: 490 },
      directions: ['-x'],
      holes: [
        { id: 'A', x: 0, y: 50, boltDiameter: 20, type: 'standard' },
        { id: 'B', x: 45, y: 50, boltDiameter: 20, type: 'standard' },
      ],
    };
    // p1 45 < 2.2·22 = 48.4; the hole's edge distance 50 mm is within 4t + 40 = 80 mm.
    expect(codes(audit(plate, EN))).toEqual(['LG204']);
    // 45 < 2.7·20 = 54 mm.
    expect(codes(audit(plate, CSA))).toEqual(['LG206']);
    // The same layout under AISC 360 meets its own rule instead: 45 < 2-2/3·20 = 53.3 mm (J3.3).
    expect(codes(audit(plate, { ...EN, standard: 'AISC 360-22' }))).toEqual(['LG201']);
  });
});
