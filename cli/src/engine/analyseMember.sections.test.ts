import { describe, expect, it } from 'vitest';
import { analyseMember } from './analyseMember.js';
import { leastChains } from './chains/leastChains.js';
import type { CodeProfile, HoleInput, MemberInput } from './types.js';

const AISC16: CodeProfile = { standard: 'AISC 360-16', method: 'LRFD', units: 'in' };
const EN: CodeProfile = { standard: 'EN 1993-1-1', method: 'LRFD', units: 'mm' };
const CSA: CodeProfile = { standard: 'CSA S16-19', method: 'LRFD', units: 'mm' };
const AISC_MM: CodeProfile = { standard: 'AISC 360-22', method: 'LRFD', units: 'mm' };

const sectionHole = (
  id: string,
  x: number,
  element: string,
  gauge: number,
  boltDiameter: number,
): HoleInput => ({
  id,
  x,
  y: Number.NaN,
  element,
  gauge,
  boltDiameter,
  type: 'standard',
});

// AISC teaching calc to AISC 360-16 (conformance/SOURCES.md R6): 2L6x6x5/8, A36, 9 × 7/8 in bolts at 3 in,
// x̄ 1.72 in, Ag 14.26 in² tabulated (the example's). Gauge 2.25 and end distance 2-1/8 derived from
// the published block shear areas (see sections.fixtures.ts).
const twoL6: MemberInput = {
  id: '2L6',
  kind: 'double-angle',
  width: 11.375,
  thickness: 0.625,
  material: { grade: 'A36', Fy: 36, Fu: 58 },
  directions: ['-x'],
  section: { shape: 'angle', a: 6, b: 6, t: 0.625, pieces: 2, tabulatedAg: 14.26 },
  holes: Array.from({ length: 9 }, (_, i) => sectionHole(`b${i + 1}`, 2.125 + 3 * i, 'leg-a', 2.25, 0.875)),
  shearLag: { connected: 'leg', length: 24, xbar: 1.72, fastenersPerLine: 9 },
  blockShear: { endDistance: 2.125 },
};

describe('analyseMember: members of flat elements', () => {
  it('R6 2L6x6x5/8 (AISC 360-16 teaching calc): An 13.01, U 0.928, φPn 525 / 462 kips, block shear φRn 706 kips', () => {
    const r = analyseMember(twoL6, AISC16);
    expect(Math.abs(r.An - 13.01)).toBeLessThanOrEqual(0.005);
    expect(Math.abs(r.U - 0.928)).toBeLessThanOrEqual(0.0005);
    expect(Math.abs(r.rupture.available - 525)).toBeLessThanOrEqual(0.5);
    expect(Math.abs(r.yielding.available - 462)).toBeLessThanOrEqual(0.5);
    expect(r.grossArea).toEqual({
      fromElements: 14.21875,
      tabulated: 14.26,
      used: 14.26,
      difference: 14.26 - 14.21875,
    });
    expect(r.shearLag?.rule).toBe('AISC 360 Table D3.1 case 2');
    expect(r.capped).toBe(false);
    const b = r.blockShear!;
    // Published to 0.01 in² (the example rounds intermediate lengths).
    for (const [k, v] of [
      ['Agv', 32.66],
      ['Anv', 22.04],
      ['Agt', 4.69],
      ['Ant', 4.07],
    ] as const) {
      expect(Math.abs(b[k] - v), k).toBeLessThanOrEqual(0.01);
    }
    expect(Math.abs(b.available - 706)).toBeLessThanOrEqual(0.5);
    expect(b.parts.map((p) => [p.element, p.kind])).toEqual([['leg-a', 'to-edge']]);
  });

  it('gives a mirrored angle (legs swapped, holes in the other leg) the same net area, U and block shear', () => {
    const unequal = (a: number, b: number, leg: string): MemberInput => ({
      ...twoL6,
      section: { shape: 'angle', a, b, t: 0.5, pieces: 1 },
      kind: 'angle',
      holes: [
        sectionHole('P', 0, leg, 2.5, 0.75),
        sectionHole('Q', 1.5, leg === 'leg-a' ? 'leg-b' : 'leg-a', 2.5, 0.75),
        sectionHole('R', 3, leg, 2.5, 0.75),
      ],
      shearLag: { connected: 'leg', length: 3, xbar: 1.0, fastenersPerLine: 2 },
      blockShear: { endDistance: 1.5, elements: [leg] },
    });
    const r1 = analyseMember(unequal(6, 4, 'leg-a'), AISC16);
    const r2 = analyseMember(unequal(4, 6, 'leg-b'), AISC16);
    expect(r2.An).toBeCloseTo(r1.An, 12);
    expect(r2.U).toBeCloseTo(r1.U, 12);
    expect(r2.blockShear!.available).toBeCloseTo(r1.blockShear!.available, 12);
    expect([...r2.directions[0]!.governing!.holes].sort()).toEqual(
      [...r1.directions[0]!.governing!.holes].sort(),
    );
  });

  it('finds the same chains for an angle as the plate engine on its unfolded width a + b − t (one flat strip)', () => {
    // Holes in both legs, staggered; the unfolded angle is a plate of width a + b − t (AISC 360 B4.3b).
    const holes = [
      sectionHole('A', 0, 'leg-a', 2.5, 0.75),
      sectionHole('B', 1.5, 'leg-a', 1.25, 0.75),
      sectionHole('C', 0.75, 'leg-b', 2.25, 0.75),
      sectionHole('D', 2.25, 'leg-b', 3.5, 0.75),
    ];
    const angleMember: MemberInput = {
      id: 'L',
      kind: 'angle',
      width: 0,
      thickness: 0.5,
      material: { Fy: 36, Fu: 58 },
      directions: ['-x', '+x'],
      U: 1,
      section: { shape: 'angle', a: 5, b: 4, t: 0.5 },
      holes,
    };
    const r = analyseMember(angleMember, AISC16, { k: 20 });
    // Leg a laid out from its toe: y = a − gauge; leg b after the heel: y = a − t + gauge.
    const unfoldedY = (h: HoleInput) => (h.element === 'leg-a' ? 5 - h.gauge! : 5 - 0.5 + h.gauge!);
    const layout = {
      width: 5 + 4 - 0.5,
      thickness: 0.5,
      holes: holes.map((h, index) => ({ id: h.id, index, x: h.x, y: unfoldedY(h), deducted: 0.875 })),
    };
    for (const d of r.directions) {
      const plate = leastChains(layout, d.direction, 20);
      expect(d.leastChains.map((c) => c.holes.join('-'))).toEqual(plate.map((c) => c.holes.join('-')));
      d.leastChains.forEach((c, i) => expect(c.netArea).toBeCloseTo(plate[i]!.netArea, 10));
    }
  });

  it('EN 1993 and AISC differ only where the rules do: same chains for the same deducted widths, different hole rule and strengths', () => {
    const plate = (dimension: number): MemberInput => ({
      id: 'P',
      kind: 'splice-plate',
      width: 200,
      thickness: 12,
      material: { Fy: 355, Fu: 490 },
      directions: ['-x'],
      holes: [
        { id: 'A', x: 0, y: 50, type: 'standard', dimension: { across: dimension, along: dimension } },
        { id: 'B', x: 40, y: 100, type: 'standard', dimension: { across: dimension, along: dimension } },
        { id: 'C', x: 0, y: 150, type: 'standard', dimension: { across: dimension, along: dimension } },
      ],
    });
    // AISC adds 2 mm (B4.3b) to an explicit 20 mm hole; EN deducts d0 = 22 mm as given.
    const aisc = analyseMember(plate(20), AISC_MM);
    const en = analyseMember(plate(22), EN);
    expect(en.holeWidths.map((h) => h.deducted)).toEqual(aisc.holeWidths.map((h) => h.deducted));
    expect(en.directions[0]!.leastChains).toEqual(aisc.directions[0]!.leastChains);
    expect(en.An).toBe(aisc.An);
    // EN 6.2.3: Npl,Rd = A fy / γM0 (1.00), Nu,Rd = 0.9 Anet fu / γM2 (1.25), no 0.85 Ag cap (AISC J4.1 only).
    expect(en.yielding.available).toBeCloseTo((2400 * 355) / 1000, 9);
    expect(en.rupture.available).toBeCloseTo((0.9 * en.An * 490) / 1.25 / 1000, 9);
    expect(en.clauses).toEqual({ yielding: 'EN 1993-1-1 6.2.3 (6.6)', rupture: 'EN 1993-1-1 6.2.3 (6.7)' });
    expect(en.capped).toBe(false);
    expect(aisc.yielding.available).toBeCloseTo(0.9 * en.yielding.available, 9);
  });

  it('R3 under the CSA S16-19 profile (Holtz T10): main plate Tr 2362 / 1924 kN with 22 mm holes + 2 mm', () => {
    const main: MemberInput = {
      id: 'MAIN',
      kind: 'splice-plate',
      width: 300,
      thickness: 25,
      material: { Fy: 350, Fu: 450 },
      directions: ['-x'],
      holes: [75, 150, 225].map((y, i) => ({
        id: `M${i}`,
        x: 0,
        y,
        type: 'standard' as const,
        dimension: { across: 22, along: 22 },
      })),
    };
    const r = analyseMember(main, CSA);
    expect(r.holeWidths[0]!.deducted).toBe(24);
    expect(Math.abs(r.yielding.available - 2362)).toBeLessThanOrEqual(0.5);
    expect(Math.abs(r.rupture.available - 1924)).toBeLessThanOrEqual(0.5);
  });

  it('takes U = 1.0 for a section without U or connection data and says why (for LG142)', () => {
    const { shearLag, blockShear, ...bare } = twoL6;
    void shearLag;
    void blockShear;
    const r = analyseMember(bare, AISC16);
    expect(r.U).toBe(1);
    expect(r.shearLag?.notApplicable).toBe('no U and no shear lag connection data are given');
    expect(r.blockShear).toBeUndefined();
  });
});
