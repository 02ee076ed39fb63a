import { describe, expect, it } from 'vitest';
import { blockOutlines } from './blockOutlines.js';
import { blockShear } from './blockShear.js';
import { blockShearAisc } from './blockShearAisc.js';
import { blockShearCsa } from './blockShearCsa.js';
import { blockShearEn } from './blockShearEn.js';
import { BlockShearError } from './blockShearError.js';
import type { BlockShearLayout } from './types.js';

/**
 * R6: AISC teaching calc to AISC 360-16, 2L6x6x5/8 (A36), 9 bolts 7/8 in at 3 in, net-area hole width
 * 1.0 in (published). Gauge 2.25 in from the heel and end distance 2.125 in are derived from the
 * published Agt and Agv; the heel is not a free edge, the toe is.
 */
const twoAngles: BlockShearLayout = {
  width: 6,
  thickness: 0.625,
  pieces: 2,
  holes: Array.from({ length: 9 }, (_, i) => ({ id: `b${i + 1}`, x: 2.125 + 3 * i, y: 2.25, deducted: 1.0 })),
  direction: '-x',
  endX: 0,
  freeEdges: { low: false, high: true },
};

describe('block shear, AISC 360 J4.3', () => {
  it('R6 2L6x6x5/8: Agv 32.66, Anv 22.04, Agt 4.69, Ant 4.07 in², φRn 706 kips', () => {
    const result = blockShear(twoAngles, {
      standard: 'AISC 360',
      Fy: 36,
      Fu: 58,
      Ubs: 1,
      method: 'LRFD',
      units: 'in',
    });
    expect(result.cases).toHaveLength(1);
    const g = result.governing!;
    expect(g.kind).toBe('one-plane-to-high-edge');
    // Published values are rounded to 0.01 in² (Anv and Ant from already-rounded Agv and Agt).
    expect(Math.abs(g.Agv - 32.66)).toBeLessThanOrEqual(0.01);
    expect(Math.abs(g.Anv - 22.04)).toBeLessThanOrEqual(0.01);
    expect(Math.abs(g.Agt - 4.69)).toBeLessThanOrEqual(0.01);
    expect(Math.abs(g.Ant - 4.07)).toBeLessThanOrEqual(0.01);
    expect(Math.abs(g.strength.available - 706)).toBeLessThanOrEqual(0.5);
    expect(g.strength.governs).toMatch(/shear yielding/);
    expect(g.source).toBe('code');
  });

  it('takes φ 0.75 for LRFD and Ω 2.00 for ASD, and the lesser shear term', () => {
    const areas = { Agv: 10, Anv: 8, Agt: 2, Ant: 1.5 };
    const lrfd = blockShearAisc(areas, { Fy: 50, Fu: 65, Ubs: 0.5, method: 'LRFD', units: 'in' });
    // min(0.6·65·8 = 312, 0.6·50·10 = 300) + 0.5·65·1.5 = 348.75 (hand-computed from J4.3)
    expect(lrfd.nominal).toBeCloseTo(348.75, 10);
    expect(lrfd.available).toBeCloseTo(0.75 * 348.75, 10);
    expect(
      blockShearAisc(areas, { Fy: 50, Fu: 65, Ubs: 0.5, method: 'ASD', units: 'in' }).available,
    ).toBeCloseTo(348.75 / 2, 10);
  });

  it('project-defined: a staggered tension plane takes its s²/4g term (no published example)', () => {
    // Plate t = 0.5, lines at y = 2 and 5, last holes at x = 4.5 and 6 (s = 1.5, g = 3), hole width 0.875.
    const plate: BlockShearLayout = {
      width: 7,
      thickness: 0.5,
      holes: [
        { id: 'a1', x: 1.5, y: 2, deducted: 0.875 },
        { id: 'a2', x: 4.5, y: 2, deducted: 0.875 },
        { id: 'b1', x: 3, y: 5, deducted: 0.875 },
        { id: 'b2', x: 6, y: 5, deducted: 0.875 },
      ],
      direction: '-x',
      endX: 0,
      freeEdges: { low: true, high: true },
    };
    const u = blockOutlines(plate).find((o) => o.kind === 'two-plane')!;
    expect(u.source).toBe('project-defined');
    expect(u.tensionHoles).toEqual(['a2', 'b2']);
    expect(u.Agv).toBeCloseTo((4.5 + 6) * 0.5, 12);
    expect(u.Anv).toBeCloseTo((4.5 - 1.5 * 0.875 + 6 - 1.5 * 0.875) * 0.5, 12);
    expect(u.Agt).toBeCloseTo(1.5, 12);
    expect(u.Ant).toBeCloseTo((3 - 0.875 + 1.5 ** 2 / 12) * 0.5, 12);
    const low = blockOutlines(plate).find((o) => o.kind === 'one-plane-to-low-edge')!;
    // Tension from y = 0 to line b: line a's hole in full, line b's half.
    expect(low.Ant).toBeCloseTo((5 - 0.875 - 0.4375 + 1.5 ** 2 / 12) * 0.5, 12);
  });

  it('works for load from +x and refuses holes on the wrong side of the loaded end', () => {
    const mirrored = {
      ...twoAngles,
      direction: '+x' as const,
      endX: 30,
      holes: twoAngles.holes.map((h) => ({ ...h, x: 30 - h.x })),
    };
    expect(blockOutlines(mirrored)[0]!.Agv).toBeCloseTo(blockOutlines(twoAngles)[0]!.Agv, 12);
    expect(() => blockOutlines({ ...twoAngles, endX: 5 })).toThrow(BlockShearError);
  });
});

describe('block tearing, EN 1993-1-8 3.10.2 (formula as published in the clause; hand-computed values)', () => {
  it('Veff,1,Rd = fu Ant/γM2 + fy Anv/(√3 γM0); Veff,2,Rd halves the tension term', () => {
    const areas = { Agv: 0, Anv: 2000, Agt: 0, Ant: 1000 };
    expect(blockShearEn(areas, { fy: 275, fu: 430, loading: 'concentric' }).available).toBeCloseTo(
      344 + 317.543,
      2,
    );
    expect(blockShearEn(areas, { fy: 275, fu: 430, loading: 'eccentric' }).available).toBeCloseTo(
      172 + 317.543,
      2,
    );
    expect(
      blockShearEn(areas, { fy: 275, fu: 430, loading: 'concentric', gammaM2: 1.1 }).available,
    ).toBeCloseTo(390.909 + 317.543, 2);
  });
});

describe('block shear, CSA S16 13.11 (form as coded in N. Holtz, CIVE 3205 notebooks, S16-09)', () => {
  it('Tr = φu [Ut An Fu + 0.6 Agv (Fy + Fu)/2], Fy in place of the mean above 485 MPa', () => {
    const areas = { Agv: 3000, Anv: 0, Agt: 0, Ant: 1000 };
    expect(blockShearCsa(areas, { Fy: 350, Fu: 450, Ut: 1 }).available).toBeCloseTo(877.5, 9);
    expect(blockShearCsa(areas, { Fy: 350, Fu: 450, Ut: 0.6 }).available).toBeCloseTo(0.75 * (270 + 720), 9);
    expect(blockShearCsa(areas, { Fy: 690, Fu: 790, Ut: 1 }).available).toBeCloseTo(
      0.75 * (790 + 0.6 * 3 * 690),
      9,
    );
  });
});
