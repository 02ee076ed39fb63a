import { describe, expect, it } from 'vitest';
import { memberShearLag } from './memberShearLag.js';
import { memberUnfolded } from './memberChainTools.js';
import type { CodeProfile, MemberInput } from './types.js';

const AISC: CodeProfile = { standard: 'AISC 360-22', method: 'LRFD', units: 'in' };
const EN: CodeProfile = { standard: 'EN 1993-1-1', method: 'LRFD', units: 'mm' };
const CSA: CodeProfile = { standard: 'CSA S16-19', method: 'LRFD', units: 'mm' };

const angleMember = (bolts: number, pitch: number): MemberInput => ({
  id: 'L',
  kind: 'angle',
  width: 0,
  thickness: 10,
  material: { Fy: 355, Fu: 490 },
  directions: ['-x'],
  section: { shape: 'angle', a: 100, b: 100, t: 10 },
  holes: Array.from({ length: bolts }, (_, i) => ({
    id: `B${i}`,
    x: pitch * i,
    y: Number.NaN,
    element: 'leg-a',
    gauge: 55,
    boltDiameter: 20,
    type: 'standard' as const,
  })),
  shearLag: { connected: 'leg', fastenersPerLine: bolts },
});
const widths = (m: MemberInput, d: number) =>
  m.holes.map((h) => ({
    holeId: h.id,
    nominalAcross: d,
    nominalAlong: d,
    allowance: 0,
    deducted: d,
    source: 'table' as const,
  }));

describe('memberShearLag', () => {
  it('uses a given U as is', () => {
    expect(memberShearLag({ ...angleMember(3, 70), U: 0.8 }, AISC, 1)).toEqual({
      U: 0.8,
      rule: 'given',
      basis: 'U = 0.8 as given',
    });
  });

  it('AISC: the larger of Table D3.1 case 2 and case 8 (L4x4x3/8, l 9, x̄ 1.13, 4 per line: 0.874 over 0.80)', () => {
    const m: MemberInput = {
      ...angleMember(4, 3),
      section: { shape: 'angle', a: 4, b: 4, t: 0.375 },
      shearLag: { connected: 'leg', length: 9, xbar: 1.13, fastenersPerLine: 4 },
    };
    const r = memberShearLag(m, AISC, 2.53)!;
    expect(r.U).toBeCloseTo(1 - 1.13 / 9, 12);
    expect(r.rule).toBe('AISC 360 Table D3.1 case 2');
  });

  it('EN 1993-1-8 3.10.3: three bolts at p1 = 70 mm, d0 = 22 mm give β3 = 0.5 + 0.2 (70/22 − 2.5)/2.5 as U', () => {
    const m = angleMember(3, 70);
    const layout = memberUnfolded(m, widths(m, 22));
    const r = memberShearLag(m, EN, 1700, layout)!;
    expect(r.rule).toBe('EN 1993-1-8 3.10.3');
    expect(r.U).toBeCloseTo(0.5 + (0.2 * (70 / 22 - 2.5)) / 2.5, 12);
  });

  it('EN 1993-1-8 3.10.3, one bolt: U = 2.0 (e2 − 0.5 d0) t / Anet with e2 from the toe (100 − 55 = 45 mm)', () => {
    const m = angleMember(1, 0);
    const layout = memberUnfolded(m, widths(m, 22));
    const r = memberShearLag(m, EN, 1680, layout)!;
    expect(r.U).toBeCloseTo((2 * (45 - 11) * 10) / 1680, 12);
  });

  it('CSA S16 12.3.3.2 (from memory, as the profile notes): angles 0.60 with fewer than 4 lines, 0.80 with 4 or more', () => {
    expect(memberShearLag(angleMember(3, 70), CSA, 1700)!.U).toBe(0.6);
    expect(memberShearLag(angleMember(4, 70), CSA, 1700)!.U).toBe(0.8);
  });

  it('says why when no rule applies (an AISC angle with 2 per line and no x̄, l), taking U = 1.0', () => {
    const m: MemberInput = { ...angleMember(2, 70), shearLag: { connected: 'leg', fastenersPerLine: 2 } };
    const r = memberShearLag(m, { ...AISC, units: 'mm' }, 1700)!;
    expect(r.U).toBe(1);
    expect(r.notApplicable).toMatch(/no Table D3.1 case applies/);
  });

  it('reports nothing for a plate with neither U nor connection data (Table D3.1 case 1)', () => {
    const { section, shearLag, ...rest } = angleMember(2, 70);
    void section;
    void shearLag;
    expect(memberShearLag({ ...rest, kind: 'plate' }, AISC, 1)).toBeUndefined();
  });
});
