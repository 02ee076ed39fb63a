import { describe, expect, it } from 'vitest';
import { memberShearLag } from './memberShearLag.js';
import { memberModel } from '../member/memberModel.js';
import type { CodeProfile, MemberInput } from '../types.js';

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
describe('memberShearLag', () => {
  it('uses a given U as is', () => {
    expect(memberShearLag(memberModel({ ...angleMember(3, 70), U: 0.8 }, AISC), 1)).toEqual({
      U: 0.8,
      rule: 'given',
      basis: 'U = 0.8 as given',
    });
  });

  it('AISC: the larger of Table D3.1 case 2 and case 8 (L4x4x3/8, l 9, x̄ 1.13, 4 per line: 0.874 over 0.80)', () => {
    // 3/4 in bolts 2.5 in from the heel. The D3 floor, leg a at its full width over the elements' Ag,
    // 4 · 0.375 / ((4 + 4 − 0.375) · 0.375) = 0.525, does not govern.
    const m: MemberInput = {
      ...angleMember(4, 3),
      section: { shape: 'angle', a: 4, b: 4, t: 0.375 },
      holes: angleMember(4, 3).holes.map((h) => ({ ...h, gauge: 2.5, boltDiameter: 0.75 })),
      shearLag: { connected: 'leg', length: 9, xbar: 1.13, fastenersPerLine: 4 },
    };
    const r = memberShearLag(memberModel(m, AISC), 2.53)!;
    expect(r.U).toBeCloseTo(1 - 1.13 / 9, 12);
    expect(r.rule).toBe('AISC 360 Table D3.1 case 2');
    expect(r.basis).toContain("D3 floor: connected elements' gross area / Ag = 1.5/2.859 = 0.525");
  });

  it('EN 1993-1-8 3.10.3: three bolts at p1 = 70 mm, d0 = 22 mm give β3 = 0.5 + 0.2 (70/22 − 2.5)/2.5 as U', () => {
    const m = angleMember(3, 70);
    const r = memberShearLag(memberModel(m, EN), 1700)!;
    expect(r.rule).toBe('EN 1993-1-8 3.10.3');
    expect(r.U).toBeCloseTo(0.5 + (0.2 * (70 / 22 - 2.5)) / 2.5, 12);
  });

  it('EN 1993-1-8 3.10.3, one bolt: U = 2.0 (e2 − 0.5 d0) t / Anet with e2 from the toe (100 − 55 = 45 mm)', () => {
    const m = angleMember(1, 0);
    const r = memberShearLag(memberModel(m, EN), 1680)!;
    expect(r.U).toBeCloseTo((2 * (45 - 11) * 10) / 1680, 12);
  });

  it('CSA S16 12.3.3.2 (from memory, as the profile notes): angles 0.60 with fewer than 4 lines, 0.80 with 4 or more', () => {
    expect(memberShearLag(memberModel(angleMember(3, 70), CSA), 1700)!.U).toBe(0.6);
    expect(memberShearLag(memberModel(angleMember(4, 70), CSA), 1700)!.U).toBe(0.8);
  });

  it('says why when no rule applies (an AISC angle with 2 per line and no x̄, l), taking U = 1.0', () => {
    const m: MemberInput = { ...angleMember(2, 70), shearLag: { connected: 'leg', fastenersPerLine: 2 } };
    const r = memberShearLag(memberModel(m, { ...AISC, units: 'mm' }), 1700)!;
    expect(r.U).toBe(1);
    expect(r.notApplicable).toMatch(/no Table D3.1 case applies/);
  });

  it('reports nothing for a plate with neither U nor connection data (Table D3.1 case 1)', () => {
    const { section, shearLag, ...rest } = angleMember(2, 70);
    void section;
    void shearLag;
    expect(memberShearLag(memberModel({ ...rest, kind: 'plate' }, AISC), 1)).toBeUndefined();
  });
});

describe('memberShearLag: the AISC 360-16/-22 D3 floor (published text: U of an open section need not be less than the connected elements’ gross area over Ag)', () => {
  // W14x68 as Quimby uses it (d 14.0, bf 10.0, tf 0.720, tw 0.415, Ag 20.0 in²), bolted through both
  // flanges with 2 bolts per line at 3 in: case 7 does not apply; case 2 with ȳ 1.29 in (WT7x34, from
  // memory) gives 1 − 1.29/3 = 0.57; the floor 2 · 10.0 · 0.720 / 20.0 = 0.72 governs.
  const w: MemberInput = {
    id: 'W',
    kind: 'w-shape',
    width: 0,
    thickness: 0.72,
    material: { Fy: 50, Fu: 65 },
    directions: ['-x'],
    section: { shape: 'w-shape', d: 14, bf: 10, tf: 0.72, tw: 0.415, tabulatedAg: 20 },
    holes: (['flange-1', 'flange-2'] as const).flatMap((element) =>
      [-2.75, 2.75].flatMap((gauge) =>
        [0, 3].map((x) => ({
          id: `${element}-${gauge}-${x}`,
          x,
          y: Number.NaN,
          element,
          gauge,
          boltDiameter: 0.875,
          type: 'standard' as const,
        })),
      ),
    ),
    shearLag: { connected: 'flange', length: 3, xbar: 1.29, fastenersPerLine: 2 },
  };

  it('raises U from case 2’s 0.57 to 0.72 and says so in the basis (before: 0.57)', () => {
    const r = memberShearLag(memberModel(w, AISC), 15)!;
    expect(r.U).toBeCloseTo(0.72, 12);
    expect(r.rule).toBe("AISC 360-22 D3 (connected elements' share of Ag)");
    expect(r.basis).toBe(
      "case 2: 1 − x̄/l = 1 − 1.29/3 = 0.57; D3 floor (governs): connected elements' gross area / Ag = 14.4/20 = 0.72",
    );
  });

  it('does not apply the floor under AISC 360-10, which has none (from memory)', () => {
    const r = memberShearLag(memberModel(w, { ...AISC, standard: 'AISC 360-10' }), 15)!;
    expect(r.U).toBeCloseTo(0.57, 12);
    expect(r.rule).toBe('AISC 360 Table D3.1 case 2');
  });

  it('counts an angle’s connected leg at its full width a·t (L4x4x1/2, one leg: 2.0 / 3.75)', () => {
    // L4x4x1/2: Ag 3.75 in² (AISC Manual). 2 bolts at 3 in, x̄ 1.18 (from memory): case 2 = 1 − 1.18/3 = 0.607;
    // floor 4 · 0.5 / 3.75 = 0.533 does not govern but is reported.
    const m: MemberInput = {
      ...angleMember(2, 3),
      section: { shape: 'angle', a: 4, b: 4, t: 0.5, tabulatedAg: 3.75 },
      holes: angleMember(2, 3).holes.map((h) => ({ ...h, gauge: 2.5, boltDiameter: 0.75 })),
      shearLag: { connected: 'leg', length: 3, xbar: 1.18, fastenersPerLine: 2 },
    };
    const r = memberShearLag(memberModel(m, AISC), 3)!;
    expect(r.U).toBeCloseTo(1 - 1.18 / 3, 12);
    expect(r.basis).toContain("D3 floor: connected elements' gross area / Ag = 2/3.75 = 0.533");
  });
});
