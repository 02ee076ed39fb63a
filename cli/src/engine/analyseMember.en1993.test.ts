import { describe, expect, it } from 'vitest';
import { analyseMember } from './analyseMember.js';
import { auditMember } from './findings/auditMember.js';
import type { CodeProfile, MemberInput } from './types.js';
import type { CalcMember } from './findings/types.js';

const EN: CodeProfile = { standard: 'EN 1993-1-1', method: 'LRFD', units: 'mm' };

// EN 1993-1-8:2005, 3.10.3(2): for an unequal-leg angle connected by its smaller leg, Anet is the net
// section area of an equivalent equal-leg angle of leg size equal to the smaller leg; Table 3.8 β
// (from memory, as the profile notes): β3 = 0.5 at p1 ≤ 2.5 d0, 0.7 at p1 ≥ 5.0 d0, linear between.
// Hand-constructed brace: L120×80×12 (leg a 120, leg b 80), S235 (fy 235, fu 360, EN 1993-1-1
// Table 3.1), three M20 bolts (d0 = 22 mm) at p1 = 70 mm, 45 mm from the heel, γM0 1.00, γM2 1.25.
//   Ag (flat elements) = (120 + 80 − 12)·12 = 2256 mm²; Anet = 2256 − 12·22 = 1992 mm².
//   β3 = 0.5 + 0.2·(70/22 − 2.5)/2.5 = 0.5 + 1.2/22 = 0.554545…
//   Smaller (80) leg bolted: equivalent L80×80×12, Ag (80 + 80 − 12)·12 = 1776, Anet 1776 − 264 =
//   1512 mm² (= 1992 − (120 − 80)·12); Nu,Rd = β3·1512·360/1.25 = 838.47·0.288 = 241.48 kN.
//   Larger (120) leg bolted: Anet 1992; Nu,Rd = β3·1992·360/1.25 = 1104.65·0.288 = 318.14 kN.
//   Npl,Rd = 2256·235/1.00 = 530.16 kN either way.
const beta3 = 0.5 + 1.2 / 22;
const brace = (leg: 'leg-a' | 'leg-b', b = 80): MemberInput => ({
  id: 'BR-1',
  kind: 'angle',
  width: 0,
  thickness: 12,
  material: { Fy: 235, Fu: 360 },
  directions: ['-x'],
  section: { shape: 'angle', a: 120, b, t: 12 },
  holes: [0, 70, 140].map((x, i) => ({
    id: `H${i + 1}`,
    x,
    y: Number.NaN,
    element: leg,
    gauge: 45,
    boltDiameter: 20,
    type: 'standard' as const,
  })),
  shearLag: { connected: 'leg', fastenersPerLine: 3 },
});

describe('EN 1993-1-8 3.10.3(2) in the member result', () => {
  it('bolted through the smaller leg: β3 on the equivalent equal-leg angle’s Anet, and says so', () => {
    const r = analyseMember(brace('leg-b'), EN);
    expect(r.Ag).toBeCloseTo(2256, 9);
    expect(r.An).toBeCloseTo(1992, 9);
    expect(r.U).toBeCloseTo(beta3, 12);
    expect(r.shearLag?.netArea?.area).toBeCloseTo(1512, 9);
    expect(r.shearLag?.netArea?.clause).toBe('EN 1993-1-8 3.10.3(2)');
    expect(r.shearLag?.basis).toContain(
      'equivalent equal-leg angle 80 × 80 × 12: 1992 − (120 − 80) × 12 = 1512',
    );
    expect(r.Ae).toBeCloseTo(beta3 * 1512, 9);
    expect(r.rupture.available).toBeCloseTo((beta3 * 1512 * 360) / 1.25 / 1000, 9);
    expect(r.rupture.available).toBeCloseTo(241.48, 2);
    expect(r.yielding.available).toBeCloseTo(530.16, 9);
    expect(r.clauses?.rupture).toBe('EN 1993-1-8 3.10.3');
  });

  it('bolted through the larger leg, or an equal angle: Anet as it is', () => {
    const larger = analyseMember(brace('leg-a'), EN);
    expect(larger.shearLag?.netArea).toBeUndefined();
    expect(larger.Ae).toBeCloseTo(beta3 * 1992, 9);
    expect(larger.rupture.available).toBeCloseTo(318.14, 2);
    // L120×120×12: Anet (120 + 120 − 12)·12 − 264 = 2472 mm².
    const equal = analyseMember(brace('leg-b', 120), EN);
    expect(equal.shearLag?.netArea).toBeUndefined();
    expect(equal.Ae).toBeCloseTo(beta3 * 2472, 9);
  });

  it('a claim made by the clause (U = β3, Ae on the equivalent angle) audits clean', () => {
    const audit = auditMember(
      {
        index: 0,
        input: brace('leg-b'),
        claims: { An: 1992, U: 0.5545, Ae: 838.5, rupture: 241.5, available: 241.5 },
      } as CalcMember,
      EN,
    );
    expect(audit.findings.filter((f) => f.class === 'overstated' || f.class === 'understated')).toEqual([]);
  });
});
