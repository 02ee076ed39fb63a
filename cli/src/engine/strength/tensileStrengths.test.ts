import { describe, expect, it } from 'vitest';
import { memberModel } from '../member/memberModel.js';
import type { CodeProfile, MemberInput } from '../types.js';
import { tensileStrengths } from './tensileStrengths.js';

const LRFD: CodeProfile = { standard: 'AISC 360-22', method: 'LRFD', units: 'in' };
const ASD: CodeProfile = { ...LRFD, method: 'ASD' };
const CSA: CodeProfile = { standard: 'CSA S16-19', method: 'LRFD', units: 'mm' };

const plate = (width: number, thickness: number, Fy: number, Fu: number): MemberInput => ({
  id: 'P',
  kind: 'plate',
  width,
  thickness,
  material: { Fy, Fu },
  directions: ['-x'],
  holes: [],
});

describe('tensileStrengths', () => {
  it('AISC 360 D2, LRFD: φ 0.90 Fy Ag and φ 0.75 Fu Ae (the conformance vector aisc-j41-splice-plate-cap: 194.4 and 221.85 kip)', () => {
    const s = tensileStrengths(memberModel(plate(12, 0.5, 36, 58), LRFD), { Ag: 6, An: 5.5625, Ae: 5.1 });
    expect(s.yielding).toEqual({ limitState: 'yielding', nominal: 216, factor: 0.9, available: 0.9 * 216 });
    expect(s.yielding.available).toBeCloseTo(194.4, 9);
    expect(s.rupture.available).toBeCloseTo(221.85, 9);
    expect(s.clauses).toBeUndefined();
  });

  it('AISC 360 D2, ASD: Ω 1.67 and 2.00', () => {
    const s = tensileStrengths(memberModel(plate(12, 0.5, 36, 58), ASD), { Ag: 6, An: 5.5625, Ae: 5.1 });
    expect(s.yielding.factor).toBe(1.67);
    expect(s.yielding.available).toBeCloseTo(216 / 1.67, 9);
    expect(s.rupture.available).toBeCloseTo((58 * 5.1) / 2, 9);
  });

  it('in mm files MPa · mm² = N, reported in kN', () => {
    const s = tensileStrengths(memberModel(plate(300, 25, 350, 450), { ...LRFD, units: 'mm' }), {
      Ag: 7500,
      An: 5700,
      Ae: 5700,
    });
    expect(s.yielding.nominal).toBeCloseTo(2625, 9);
  });

  it('CSA S16 13.2 from its profile, with clauses: Holtz Example T10 (conformance/SOURCES.md R3) main plate 2362 and 1924 kN published', () => {
    const s = tensileStrengths(memberModel(plate(300, 25, 350, 450), CSA), { Ag: 7500, An: 5700, Ae: 5700 });
    expect(Math.abs(s.yielding.available - 2362)).toBeLessThanOrEqual(0.5);
    expect(Math.abs(s.rupture.available - 1924)).toBeLessThanOrEqual(0.5);
    expect(s.clauses).toEqual({
      yielding: expect.stringContaining('13.2'),
      rupture: expect.stringContaining('13.2'),
    });
  });
});
