import { describe, expect, it } from 'vitest';
import { analyseMember } from '../analyseMember.js';
import { memberModel } from '../member/memberModel.js';
import { memberBlockShear } from './memberBlockShear.js';
import type { CodeProfile, MemberInput } from '../types.js';

const LRFD: CodeProfile = { standard: 'AISC 360-22', method: 'LRFD', units: 'in' };
// Plate 10 × 1/2, A36, two lines of 3/4 in bolts at y = 3 and 7, rows at x = 0 and 3, end distance 1.5.
const plate = (xs: readonly number[]): MemberInput => ({
  id: 'P',
  kind: 'gusset',
  width: 10,
  thickness: 0.5,
  material: { Fy: 36, Fu: 58 },
  directions: ['-x', '+x'],
  holes: [3, 7].flatMap((y) =>
    xs.map((x, i) => ({ id: `${y}-${i}`, x, y, boltDiameter: 0.75, type: 'standard' as const })),
  ),
  blockShear: { endDistance: 1.5 },
});

describe('memberBlockShear', () => {
  it('AISC 360 J4.3 two-plane tear-out of a plate by hand: Agv 4.5, Anv 3.1875, Agt 2.0, Ant 1.5625 in²', () => {
    // Common practice, hand check: shear planes 2 × (3 + 1.5) = 9 in long less 1.5 holes each;
    // tension plane 4 in less one hole; Rn = min(0.6·58·3.1875, 0.6·36·4.5) + 58·1.5625 = 97.2 + 90.625.
    const m = plate([0, 3]);
    const r = memberBlockShear(memberModel(m, LRFD), ['-x'])!;
    expect([r.Agv, r.Anv, r.Agt, r.Ant]).toEqual([4.5, 3.1875, 2, 1.5625]);
    expect(r.available).toBeCloseTo(0.75 * (97.2 + 90.625), 9);
    expect(r.parts[0]!.kind).toBe('two-plane');
    expect(r.projectDefined).toBe(false);
  });

  it('gives the same tear-out from either end for a symmetric bolt group, reporting the direction that governs', () => {
    const m = plate([0, 3]);
    const minus = memberBlockShear(memberModel(m, LRFD), ['-x'])!;
    const plus = memberBlockShear(memberModel(m, LRFD), ['+x'])!;
    expect(plus.available).toBeCloseTo(minus.available, 12);
    expect(memberBlockShear(memberModel(m, LRFD), ['-x', '+x'])!.direction).toBe('-x');
  });

  it('-x tears toward the +x end: 3 + 2 bolts, the short line at the free end (AISC 360 J4.3, by hand)', () => {
    // 10 × 1/2 plate, A36, 3/4 in bolts (0.875 deducted): line y = 3 at x = 0, 3, 6; line y = 7 at
    // x = 3, 6; end distance 1.5, so the free end is x = 7.5. Each line's hole nearest the body (−x)
    // takes the tension plane: a1 (x 0) and b1 (x 3), s = 3, g = 4. Least outline by hand: to the
    // y = 0 edge, shear along y = 7 only (4.5 in, 1.5 holes), tension 7 in less 1.5 holes plus 9/16:
    // Rn = min(0.6·58·1.59375, 0.6·36·2.25) + 58·(7 − 1.3125 + 0.5625)·0.5 = 48.6 + 181.25.
    const m: MemberInput = {
      ...plate([]),
      directions: ['-x'],
      holes: [
        ...[0, 3, 6].map((x, i) => ({
          id: `a${i + 1}`,
          x,
          y: 3,
          boltDiameter: 0.75,
          type: 'standard' as const,
        })),
        ...[3, 6].map((x, i) => ({
          id: `b${i + 1}`,
          x,
          y: 7,
          boltDiameter: 0.75,
          type: 'standard' as const,
        })),
      ],
    };
    const r = memberBlockShear(memberModel(m, LRFD), ['-x'])!;
    const u = r.outlines.find((o) => o.kind === 'two-plane')!;
    expect(u.tensionHoles).toEqual(['a1', 'b1']);
    expect(u.Agv).toBeCloseTo((7.5 + 4.5) * 0.5, 12);
    expect(r.kind).toBe('to-edge');
    expect([r.Agv, r.Anv, r.Agt, r.Ant]).toEqual([2.25, 1.59375, 3.5, 3.125]);
    expect(r.available).toBeCloseTo(0.75 * (48.6 + 181.25), 9);
    // The old reading (free end at x = −1.5, tension at a3 and b2) gave 184.45 kips, 7.0 % over.
    for (const o of r.outlines) expect(o.available).toBeGreaterThanOrEqual(r.available);
  });

  it('is undefined without block-shear input or without holes', () => {
    const { blockShear, ...bare } = plate([0, 3]);
    void blockShear;
    expect(memberBlockShear(memberModel(bare, LRFD), ['-x'])).toBeUndefined();
    expect(memberBlockShear(memberModel({ ...plate([]), holes: [] }, LRFD), ['-x'])).toBeUndefined();
  });

  it('enters the governing strength when it is the least of yielding, rupture and block shear', () => {
    // Same plate by hand: yielding 0.9·36·5 = 162, rupture 0.75·58·4.125 = 179.4, block shear 140.87 kips.
    const r = analyseMember(plate([0, 3]), LRFD);
    expect(r.governing.limitState).toBe('block shear');
    expect(r.governing.available).toBeCloseTo(0.75 * (97.2 + 90.625), 9);
    expect(r.governing.factor).toBe(0.75);
    const { blockShear, ...bare } = plate([0, 3]);
    void blockShear;
    expect(analyseMember(bare, LRFD).governing.limitState).toBe('yielding');
  });
});
