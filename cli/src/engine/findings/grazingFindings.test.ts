import { describe, expect, it } from 'vitest';
import { analyseMember } from '../analyseMember.js';
import { auditMember } from './auditMember.js';
import { grazingFindings } from './grazingFindings.js';
import { memberModel } from '../member/memberModel.js';
import type { CodeProfile, HoleInput, MemberInput } from '../types.js';
import type { CalcMember } from './types.js';

const AISC: CodeProfile = { standard: 'AISC 360-22', method: 'LRFD', units: 'in' };
const EN: CodeProfile = { standard: 'EN 1993-1-1', method: 'LRFD', units: 'mm' };
const audit = (input: MemberInput, profile: CodeProfile) =>
  auditMember({ index: 0, input } as CalcMember, profile);

const leg = (id: string, element: 'leg-a' | 'leg-b', x: number, slot = false): HoleInput => ({
  id,
  x,
  y: Number.NaN,
  element,
  gauge: 2,
  boltDiameter: 0.75,
  ...(slot ? { type: 'long-slotted' as const, slot: 'across' as const } : { type: 'standard' as const }),
});
// L4x4x1/2 (hand-constructed), 3/4 in bolts, every gauge 2 in from the heel (u = 2 − t/2 = 1.75).
// F (leg b, x 0) and A (leg a, x 3) are 2 + 2 − 0.5 = 3.5 in apart across the heel (AISC 360 B4.3b);
// B is a long slot across the load on F's gauge line, `xB` further along. Deducted widths (AISC 360
// Table J3.3 and B4.3b, +1/16 in): standard 13/16 + 1/16 = 0.875; long slot 1-7/8 + 1/16 = 1.9375,
// radius 0.96875 in. Holes listed F, B, A so B is /holes/1 in the file, not first in unfolded y.
const angleMember = (xB: number): MemberInput => ({
  id: 'L1',
  kind: 'angle',
  width: 7.5,
  thickness: 0.5,
  material: { Fy: 36, Fu: 58 },
  directions: ['-x'],
  section: { shape: 'angle', a: 4, b: 4, t: 0.5 },
  holes: [leg('F', 'leg-b', 0), leg('B', 'leg-b', xB, true), leg('A', 'leg-a', 3)],
});

const IN = AISC;
const bolt = (id: string, x: number, y: number, d = 0.75): HoleInput => ({
  id,
  x,
  y,
  boltDiameter: d,
  type: 'standard',
});
const plate = (width: number, holes: HoleInput[]): MemberInput => ({
  id: 'P1',
  kind: 'plate',
  width,
  thickness: 0.5,
  material: { Fy: 36, Fu: 58 },
  directions: ['-x'],
  holes,
});

describe('grazingFindings on plates (LG203)', () => {
  it('flags a governing fracture line passing within a hole’s radius (deducted width / 2) of a hole it does not deduct (LG203)', () => {
    // A straight row A, E, C at x = 0, and beside E on its gauge line a long slot across the load
    // (3/4 in bolt: 1-7/8 + 1/16 = 1.9375 in deducted, radius 0.96875) 0.85 in further along. No chain
    // through B can form from -x (E lies on its loaded side), so A–E–C governs and passes 0.85 from B.
    const slot: HoleInput = {
      id: 'B',
      x: 0.85,
      y: 5,
      boltDiameter: 0.75,
      type: 'long-slotted',
      slot: 'across',
    };
    const m = plate(10, [bolt('A', 0, 2), bolt('E', 0, 5), slot, bolt('C', 0, 8)]);
    const r = analyseMember(m, IN);
    expect(r.directions[0]!.governing!.holes).toEqual(['A', 'E', 'C']);
    const found = grazingFindings(memberModel(m, IN), r, '/members/0').filter((f) => f.code === 'LG203');
    expect(found).toEqual([
      expect.objectContaining({
        holes: ['B'],
        chain: ['A', 'E', 'C'],
        direction: '-x',
        pointer: '/members/0/holes/2',
      }),
    ]);
    expect(found[0]!.claimed).toBeCloseTo(0.85, 12);
    expect(found[0]!.recomputed).toBeCloseTo(0.96875, 12);
  });

  it('does not flag a round hole the line passes at more than its radius', () => {
    const m = plate(10, [bolt('A', 0, 2), bolt('E', 0, 5), bolt('B', 0.85, 5), bolt('C', 0, 8)]);
    expect(grazingFindings(memberModel(m, IN), analyseMember(m, IN), '/members/0')).toEqual([]);
  });
});

describe('grazingFindings on sections (LG203, measured on the unfolded section)', () => {
  // Chains from -x, by hand (cli/docs/method.md §4): B shares F's gauge line, so any chain through B has F
  // (x 0 < xB) on its loaded side; {A} has F on its loaded side. {F}: An = 3.75 − 0.4375 = 3.3125;
  // {F, A}: 3.75 − 2(0.4375) + (3²/(4·3.5))·0.5 = 3.75 − 0.875 + 0.3214 = 3.1964 in², governs.
  // Its leg runs from F (x 0, w 0) to A (x 3, w 3.5) in the developed plane across the heel (w along
  // the centrelines from F); B sits at (xB, w 0). Perpendicular distance xB·3.5 / √(3² + 3.5²):
  //   xB = 1.0 → 3.5 / 4.6098 = 0.7593 in < 0.96875: the line cuts the slot (B's x offset alone,
  //   1.0 in, is more than the radius: the diagonal across the heel is what brings it within);
  //   xB = 1.4 → 4.9 / 4.6098 = 1.0630 in > 0.96875: clear.
  it('flags a slot the governing line passes within its radius across the heel, pointing at its file index', () => {
    const m = angleMember(1.0);
    const r = analyseMember(m, AISC);
    expect(r.directions[0]!.governing!.holes).toEqual(['A', 'F']);
    expect(r.directions[0]!.An).toBeCloseTo(3.75 - 0.875 + 9 / 28, 9);
    const found = grazingFindings(memberModel(m, AISC), r, '/members/0');
    expect(found).toEqual([
      expect.objectContaining({
        code: 'LG203',
        holes: ['B'],
        chain: ['A', 'F'],
        direction: '-x',
        pointer: '/members/0/holes/1',
      }),
    ]);
    expect(found[0]!.claimed).toBeCloseTo(3.5 / Math.sqrt(9 + 12.25), 9);
    expect(found[0]!.recomputed).toBeCloseTo(0.96875, 12);
    expect(found[0]!.message).toContain('hole B (leg-b)');
    // The member audit makes the check on sections too.
    expect(
      audit(m, AISC)
        .findings.filter((f) => f.code === 'LG203')
        .map((f) => f.pointer),
    ).toEqual(['/members/0/holes/1']);
  });

  it('does not flag the slot once the line passes it at more than its radius', () => {
    const m = angleMember(1.4);
    const r = analyseMember(m, AISC);
    expect(r.directions[0]!.governing!.holes).toEqual(['A', 'F']);
    expect(grazingFindings(memberModel(m, AISC), r, '/members/0')).toEqual([]);
  });

  it('is made under the EN 1993-1-1 profile as well (a geometric check, not a code rule)', () => {
    // EN plate 200 × 10 mm, holes sized explicitly (d0 deducted, no allowance): A, E, C at x 0 on
    // y 50, 100, 150 (d0 22); B on E's gauge line 24 mm along, 50 mm across the load (radius 25). Any
    // chain through B has E on its loaded side, so A–E–C governs and passes 24 mm from B's centre.
    const hole = (id: string, x: number, y: number, across = 22): HoleInput => ({
      id,
      x,
      y,
      type: across === 22 ? 'standard' : 'long-slotted',
      dimension: { across, along: 22 },
    });
    const m: MemberInput = {
      id: 'P1',
      kind: 'plate',
      width: 200,
      thickness: 10,
      material: { Fy: 355, Fu: 490 },
      directions: ['-x'],
      holes: [hole('A', 0, 50), hole('E', 0, 100), hole('B', 24, 100, 50), hole('C', 0, 150)],
    };
    const found = audit(m, EN).findings.filter((f) => f.code === 'LG203');
    expect(found.map((f) => [f.holes, f.pointer, f.claimed, f.recomputed])).toEqual([
      [['B'], '/members/0/holes/2', 24, 25],
    ]);
  });
});
