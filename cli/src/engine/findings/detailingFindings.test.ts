import { describe, expect, it } from 'vitest';
import { memberModel } from '../member/memberModel.js';
import { detailingFindings } from './detailingFindings.js';
import type { CodeProfile, HoleInput, MemberInput } from '../types.js';

const IN: CodeProfile = { standard: 'AISC 360-22', method: 'LRFD', units: 'in' };
const MM: CodeProfile = { standard: 'AISC 360-22', method: 'LRFD', units: 'mm' };
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
const run = (m: MemberInput, profile = IN) => detailingFindings(memberModel(m, profile), '/members/0');

describe('detailingFindings', () => {
  it('finds nothing in the D.9 layout (AISC Design Examples v13.0 D.9 geometry)', () => {
    expect(run(plate(14, [bolt('A', 0, 2), bolt('B', 2.5, 5), bolt('C', 2.5, 9), bolt('D', 0, 12)]))).toEqual(
      [],
    );
  });

  it('flags holes closer than 2-2/3 d = 2.00 in for 3/4 in bolts (AISC 360 J3.3), not at exactly 2.00 in', () => {
    const close = run(plate(10, [bolt('A', 0, 4), bolt('B', 1.75, 4)]));
    expect(close).toEqual([
      expect.objectContaining({
        code: 'LG201',
        class: 'detailing',
        severity: 'warning',
        holes: ['A', 'B'],
        claimed: 1.75,
        pointer: '/members/0/holes/1',
      }),
    ]);
    expect(close[0]!.recomputed).toBeCloseTo(2, 12);
    expect(run(plate(10, [bolt('A', 0, 4), bolt('B', 2, 4)]))).toEqual([]);
  });

  it('flags edge distance across the load below Table J3.4: 3/4 in bolt needs 1 in (published, AISC 360-16)', () => {
    const found = run(plate(10, [bolt('A', 0, 0.9), bolt('B', 0, 9)]));
    expect(found).toEqual([
      expect.objectContaining({
        code: 'LG202',
        holes: ['A'],
        claimed: 0.9,
        recomputed: 1,
        pointer: '/members/0/holes/0/y',
      }),
    ]);
  });

  it('flags edge distance in mm below Table J3.4M: M20 needs 26 mm (published)', () => {
    const m: MemberInput = { ...plate(200, [bolt('A', 0, 25, 20), bolt('B', 0, 100, 20)]), thickness: 12 };
    expect(run(m, MM).map((f) => [f.code, f.holes])).toEqual([['LG202', ['A']]]);
  });

  it('skips holes given only by dimension for spacing and edge distance', () => {
    const m = plate(10, [
      { id: 'A', x: 0, y: 0.5, type: 'standard', dimension: { across: 0.5, along: 0.5 } },
      { id: 'B', x: 0.9, y: 0.5, type: 'standard', dimension: { across: 0.5, along: 0.5 } },
    ]);
    expect(run(m).filter((f) => f.code !== 'LG203')).toEqual([]);
  });
});

describe('detailingFindings: Table J3.5 increments and the AISC 360-10 sheared-edge column (from memory)', () => {
  const holeAt = (y: number, extra: Partial<HoleInput>): HoleInput => ({ ...bolt('A', 0, y), ...extra });
  const lg202 = (h: HoleInput, profile = IN) =>
    run(plate(10, [h]), profile).filter((f) => f.code === 'LG202');

  it('adds C2 = 1/16 in for an oversized 3/4 in hole: 1 in is below 1-1/16 (Table J3.5, from memory)', () => {
    const f = lg202(holeAt(1, { type: 'oversized' }));
    expect(f).toHaveLength(1);
    expect(f[0]!.recomputed).toBeCloseTo(1.0625, 12);
    expect(f[0]!.message).toBe(
      'Hole A is 1.000 in from the y = 0 edge, below the 1.063 in of AISC 360 Table J3.4 (1.000 in) + C2 0.063 in for an oversized hole (Table J3.5)',
    );
  });

  it('takes C2 = 0 for a slot parallel to the edge (along the load) and 0.75 d across it, reduced for a shorter slot', () => {
    expect(lg202(holeAt(1, { type: 'long-slotted', slot: 'along' }))).toEqual([]);
    // Across: 1 + 0.75 · 0.75 = 1.5625 > 1.5.
    expect(lg202(holeAt(1.5, { type: 'long-slotted', slot: 'across' }))[0]?.recomputed).toBeCloseTo(
      1.5625,
      12,
    );
    // An explicit 1-1/2 in slot (maximum 2.5 d = 1.875): C2 = 0.5625 − (1.875 − 1.5)/2 = 0.375 → 1.375 ≤ 1.5.
    expect(
      lg202(holeAt(1.5, { type: 'long-slotted', slot: 'across', dimension: { across: 1.5, along: 0.8125 } })),
    ).toEqual([]);
    // Short slot across the load: C2 = 1/8 in for 3/4 in bolts.
    expect(lg202(holeAt(1.1, { type: 'short-slotted', slot: 'across' }))[0]?.recomputed).toBeCloseTo(
      1.125,
      12,
    );
  });

  it('AISC 360-10: holds the rolled / thermally cut column (1 in for 3/4 in), naming the sheared-edge 1-1/4 in', () => {
    const IN10: CodeProfile = { ...IN, standard: 'AISC 360-10' };
    expect(lg202(holeAt(1, {}), IN10)).toEqual([]);
    const f = lg202(holeAt(0.875, {}), IN10);
    expect(f[0]!.message).toBe(
      'Hole A is 0.875 in from the y = 0 edge, below the 1.000 in of AISC 360 Table J3.4, rolled or thermally cut edges; at a sheared edge AISC 360-10 asks 1.250 in (from memory)',
    );
  });
});
