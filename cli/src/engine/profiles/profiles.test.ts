import { describe, expect, it } from 'vitest';
import { angle } from '../sections/angle.js';
import { analyseSection } from '../sections/analyseSection.js';
import { plateSection } from '../sections/plateSection.js';
import { unfold } from '../sections/unfold.js';
import { csaS16Detailing } from './csaS16Detailing.js';
import { csaS16EffectiveNetArea } from './csaS16EffectiveNetArea.js';
import { csaS16HoleWidth } from './csaS16HoleWidth.js';
import { CSA_S16_19 } from './csaS16Profile.js';
import { en1993AngleOneLeg } from './en1993AngleOneLeg.js';
import { en1993Detailing } from './en1993Detailing.js';
import { en1993HoleDiameter } from './en1993HoleDiameter.js';
import { en1993NetArea } from './en1993NetArea.js';
import { EN_1993_1_1, en1993Profile } from './en1993Profile.js';
import { en1993SectionNetArea } from './en1993SectionNetArea.js';
import { en1993TensionResistance } from './en1993TensionResistance.js';
import { holeSpacings } from './holeSpacings.js';
import { ProfileError } from './profileError.js';

describe('EN 1993-1-1 profile', () => {
  it('sizes d0 by EN 1090-2 normal clearance: 1 mm M12–M14, 2 mm M16–M24, 3 mm M27 and up (conformance/SOURCES.md, Tables)', () => {
    expect([12, 14, 16, 20, 24, 27, 30, 36].map(en1993HoleDiameter)).toEqual([
      13, 15, 18, 22, 26, 30, 33, 39,
    ]);
    expect(() => en1993HoleDiameter(10)).toThrow(ProfileError);
    expect(EN_1993_1_1.holeWidth({ boltDiameter: 20 })).toMatchObject({
      nominal: 22,
      allowance: 0,
      deducted: 22,
    });
  });

  it('R7 Steel Buildings in Europe, Part 8, Worked Example 3: L120×80×12 with three M20 in one row, Anet = 2006 mm²', () => {
    const d0 = EN_1993_1_1.holeWidth({ boltDiameter: 20 }).deducted;
    // A = 2270 mm² (published); the row's gauge (50 mm in the 120 leg) and pitch (70 mm) are placed.
    const holes = [0, 70, 140].map((x, i) => ({ id: `M${i}`, element: 'leg-a', x, gauge: 50, deducted: d0 }));
    const lay = unfold(angle(120, 80, 12), holes, { tabulatedAg: 2270 });
    const r = en1993SectionNetArea(lay, '-x');
    expect(r.Anet).toBe(2006);
    expect(r.straightDeduction).toBe(264);
    expect(en1993NetArea(2270, 12, [{ holes: 22, stagger: 0 }]).Anet).toBe(2006);
  });

  it('takes the larger of the straight and the staggered deduction (6.2.2.2)', () => {
    // Two holes d0 22 at p = 60 across, s = 40: staggered deduction t(2·22 − 40²/240) = 10·37.33 > one hole 220.
    const r = en1993NetArea(3000, 10, [
      { holes: 22, stagger: 0 },
      { holes: 44, stagger: 1600 / 240 },
    ]);
    expect(r.governing).toBe(1);
    expect(r.Anet).toBeCloseTo(3000 - 10 * (44 - 1600 / 240), 9);
  });

  it('Npl,Rd = A fy/γM0 and Nu,Rd = 0.9 Anet fu/γM2 with γM0 1.00, γM2 1.25 recommended and overridable', () => {
    const r = en1993TensionResistance({ Ag: 3000, An: 2500, Fy: 355, Fu: 510 });
    expect(r.yielding.available).toBeCloseTo(1065, 9);
    expect(r.rupture.available).toBeCloseTo(918, 9);
    expect(r.governing.limitState).toBe('rupture');
    expect(
      en1993Profile({ gammaM2: 1.1 }).tensionResistance({ Ag: 3000, An: 2500, Fy: 355, Fu: 510 }).rupture
        .available,
    ).toBeCloseTo((0.9 * 2500 * 510) / 1.1 / 1000, 9);
  });

  it('angles connected by one leg (EN 1993-1-8 3.10.3; Table 3.8 β from memory): β by pitch interpolation, one-bolt formula with e2', () => {
    expect(en1993AngleOneLeg({ bolts: 2, d0: 22, t: 10, fu: 430, Anet: 1000, p1: 55 }).beta).toBeCloseTo(
      0.4,
      12,
    );
    expect(en1993AngleOneLeg({ bolts: 3, d0: 22, t: 10, fu: 430, Anet: 1000, p1: 110 }).beta).toBeCloseTo(
      0.7,
      12,
    );
    expect(en1993AngleOneLeg({ bolts: 3, d0: 22, t: 10, fu: 430, Anet: 1000, p1: 82.5 }).beta).toBeCloseTo(
      0.6,
      12,
    );
    // 2.0 (e2 − 0.5 d0) t fu / γM2 = 2.0 (40 − 11)(10)(430)/1.25 = 199.52 kN
    expect(en1993AngleOneLeg({ bolts: 1, d0: 22, t: 10, fu: 430, e2: 40 }).NuRd).toBeCloseTo(199.52, 9);
    expect(() => en1993AngleOneLeg({ bolts: 2, d0: 22, t: 10, fu: 430 })).toThrow(/Anet and p1/);
  });

  it('EN 1993-1-8:2005 3.10.3(2): an unequal angle connected by its smaller leg takes Anet of the equivalent equal-leg angle', () => {
    // L120×80×12, Anet 2006 mm² as it is (R7), three bolts, d0 22, p1 82.5 = 3.75 d0 → β3 = 0.6
    // (Table 3.8, from memory). Smaller leg connected: equivalent L80×80×12, the outstanding leg
    // 40 mm shorter: Anet = 2006 − (120 − 80)·12 = 1526 mm²; Nu,Rd = 0.6·1526·360/1.25 = 263.69 kN.
    const base = { bolts: 3, d0: 22, t: 12, fu: 360, Anet: 2006, p1: 82.5 };
    const smaller = en1993AngleOneLeg({ ...base, legs: { connected: 80, outstanding: 120 } });
    expect(smaller).toEqual({
      NuRd: expect.any(Number),
      beta: expect.any(Number),
      Anet: 1526,
      equivalentLeg: 80,
    });
    expect(smaller.NuRd).toBeCloseTo((0.6 * 1526 * 360) / 1.25 / 1000, 9);
    // Larger leg connected, or an equal angle: Anet as it is, 0.6·2006·360/1.25 = 346.64 kN.
    for (const legs of [{ connected: 120, outstanding: 80 }, { connected: 80, outstanding: 80 }, undefined]) {
      const r = en1993AngleOneLeg({ ...base, ...(legs ? { legs } : {}) });
      expect(r.Anet).toBe(2006);
      expect(r.equivalentLeg).toBeUndefined();
      expect(r.NuRd).toBeCloseTo((0.6 * 2006 * 360) / 1.25 / 1000, 9);
    }
    // One bolt: (3.11) has no Anet, so the rule changes nothing.
    expect(
      en1993AngleOneLeg({
        bolts: 1,
        d0: 22,
        t: 12,
        fu: 360,
        e2: 40,
        legs: { connected: 80, outstanding: 120 },
      }).Anet,
    ).toBeNull();
  });

  it('EN 1993-1-8 Table 3.3 (published): e1, e2 ≥ 1.2 d0, p1 ≥ 2.2 d0, p2 ≥ 2.4 d0, e ≤ 4t + 40, p ≤ min(14t, 200)', () => {
    const d0 = 22;
    const limits = en1993Detailing({
      d0,
      t: 10,
      e1: 26,
      e2: 26,
      p1: 48,
      p2: 52,
      eMax: 81,
      pMax: 141,
      exposed: true,
    }).map((i) => [i.quantity, i.kind, i.limit]);
    expect(limits).toEqual([
      ['e1', 'minimum', expect.closeTo(26.4, 9)],
      ['e2', 'minimum', expect.closeTo(26.4, 9)],
      ['p1', 'minimum', expect.closeTo(48.4, 9)],
      ['p2', 'minimum', expect.closeTo(52.8, 9)],
      ['e', 'maximum', 80],
      ['p', 'maximum', 140],
    ]);
    expect(
      en1993Detailing({
        d0,
        t: 20,
        e1: 26.4,
        e2: 26.4,
        p1: 48.4,
        p2: 52.8,
        eMax: 120,
        pMax: 200,
        exposed: true,
      }),
    ).toEqual([]);
    expect(en1993Detailing({ d0, t: 20, pMax: 201, exposed: true })[0]?.limit).toBe(200);
  });

  it('EN 1993-1-8 Table 3.3 note 1 (from memory): maxima apply to a tension member only when exposed to weather or corrosion', () => {
    // Before: e 81 > 80 and p 141 > 140 were warned for every member (LG205) whatever its exposure.
    expect(en1993Detailing({ d0: 22, t: 10, eMax: 81, pMax: 141 })).toEqual([]);
    expect(en1993Detailing({ d0: 22, t: 10, eMax: 81, pMax: 141, exposed: false })).toEqual([]);
  });

  it('EN 1993-1-8 Table 3.3 note 5 (from memory): staggered rows may have p2 ≥ 1.2 d0 when L ≥ 2.4 d0', () => {
    // M20, d0 22: staggered lines 30 mm apart (≥ 26.4) with centres 60 mm apart (≥ 52.8) pass; before,
    // p2 30 < 2.4 d0 = 52.8 was warned.
    expect(en1993Detailing({ d0: 22, p2Staggered: 30, L: 60 })).toEqual([]);
    expect(en1993Detailing({ d0: 22, p2Staggered: 25, L: 50 }).map((i) => [i.quantity, i.limit])).toEqual([
      ['p2', expect.closeTo(26.4, 9)],
      ['L', expect.closeTo(52.8, 9)],
    ]);
    // Lines in line (not staggered) keep p2 ≥ 2.4 d0.
    expect(en1993Detailing({ d0: 22, p2: 30 }).map((i) => i.quantity)).toEqual(['p2']);
  });

  it('measures spacings from a hole pattern for the rules', () => {
    const s = holeSpacings(
      [
        { x: 40, y: 30 },
        { x: 110, y: 30 },
        { x: 40, y: 90 },
      ],
      120,
      [0, 300],
    );
    expect(s).toEqual({ e1: 40, e2: 30, p1: 70, p2: 60, L: 60, eMax: 40, pMax: 70 });
    expect(en1993Detailing({ d0: 22, ...s })).toEqual([]);
    // Two staggered lines 30 apart: no hole of one at the x of a hole of the other.
    const staggered = holeSpacings(
      [
        { x: 0, y: 40 },
        { x: 100, y: 40 },
        { x: 50, y: 70 },
      ],
      110,
    );
    expect(staggered).toMatchObject({ p1: 100, p2Staggered: 30, L: Math.hypot(50, 30) });
    expect(staggered.p2).toBeUndefined();
  });
});

describe('CSA S16-19 profile', () => {
  it('R3 N. Holtz, Carleton CSA S16 notes, Example T10: main plate 300 × 25, 350W: Tr gross 2362 kN, net 1924 kN', () => {
    const w = CSA_S16_19.holeWidth({ holeDiameter: 22 }).deducted; // 22 mm punched + 2 = 24 (published)
    expect(w).toBe(24);
    const holes = [75, 150, 225].map((y, i) => ({
      id: `h${i}`,
      element: 'plate',
      x: 0,
      gauge: y,
      deducted: w,
    }));
    const r = analyseSection(plateSection(300, 25), holes);
    expect(r.An).toBe(5700); // wn = 300 − 3·24 = 228 mm (published)
    const tr = CSA_S16_19.tensionResistance({ Ag: 7500, An: r.An, Fy: 350, Fu: 450 });
    expect(Math.abs(tr.yielding.available - 2362)).toBeLessThanOrEqual(0.5); // 2362.5, printed 2362
    expect(Math.abs(tr.rupture.available - 1924)).toBeLessThanOrEqual(0.5);
  });

  it('R3 lap plates 220 × 14: wn 148 mm, An 2072 mm², Tr 1399 kN net and 1940 kN gross for both plates', () => {
    const holes = [35, 110, 185].map((y, i) => ({
      id: `h${i}`,
      element: 'plate',
      x: 0,
      gauge: y,
      deducted: 24,
    }));
    const r = analyseSection(plateSection(220, 14), holes);
    expect(r.An).toBe(2072);
    const tr = CSA_S16_19.tensionResistance({ Ag: 2 * 3080, An: 2 * r.An, Fy: 350, Fu: 450 });
    expect(Math.abs(tr.rupture.available - 1399)).toBeLessThanOrEqual(0.5);
    expect(Math.abs(tr.yielding.available - 1940)).toBeLessThanOrEqual(0.5);
  });

  it('angles: Ane = 0.80 An with 4 or more transverse lines, 0.60 with fewer (R3, published)', () => {
    expect(csaS16EffectiveNetArea({ An: 1000, shape: 'angle', transverseLines: 4 }).Ane).toBeCloseTo(800, 9);
    expect(csaS16EffectiveNetArea({ An: 1000, shape: 'angle', transverseLines: 3 }).Ane).toBeCloseTo(600, 9);
    // W flanges with bf ≥ 2/3 d and 3+ lines: 0.90 (secondary source, see the function's notes).
    expect(
      csaS16EffectiveNetArea({ An: 1000, shape: 'w-flange', transverseLines: 3, bf: 200, d: 300 }).factor,
    ).toBe(0.9);
  });

  it('centre-to-centre spacing ≥ 2.7 d, not gauge-line distance (CSA S16 22.3.1; R3 published 2.7d)', () => {
    // M20 staggered: gauge lines 40 mm apart (< 54) but centres 64 mm apart: a good detail; before, p2
    // 40 < 54 was warned (LG206).
    expect(csaS16Detailing({ d0: 22, boltDiameter: 20, p2Staggered: 40, L: 64 })).toEqual([]);
    expect(csaS16Detailing({ d0: 22, boltDiameter: 20, L: 50 }).map((i) => [i.quantity, i.limit])).toEqual([
      ['L', expect.closeTo(54, 9)],
    ]);
  });

  it('pitch ≥ 2.7 d (R3, published); hole deducted = hole + 2 mm', () => {
    expect(
      csaS16Detailing({ d0: 22, boltDiameter: 20, p1: 53, p2: 54 }).map((i) => [i.quantity, i.limit]),
    ).toEqual([['p1', 54]]);
    expect(csaS16HoleWidth({ holeDiameter: 22 })).toMatchObject({
      allowance: 2,
      deducted: 24,
      source: 'explicit',
    });
  });
});
