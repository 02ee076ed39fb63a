import { describe, expect, it } from 'vitest';
import { memberModel } from '../member/memberModel.js';
import { profileDetailingFindings } from './profileDetailingFindings.js';
import type { CodeProfile, MemberInput } from '../types.js';

const EN: CodeProfile = { standard: 'EN 1993-1-1', method: 'LRFD', units: 'mm' };
const CSA: CodeProfile = { standard: 'CSA S16-19', method: 'LRFD', units: 'mm' };

const plate = (width: number, holes: readonly (readonly [number, number])[]): MemberInput => ({
  id: 'P',
  kind: 'plate',
  width,
  thickness: 10,
  material: { Fy: 355, Fu: 490 },
  directions: ['-x'],
  holes: holes.map(([x, y], i) => ({ id: `H${i}`, x, y, boltDiameter: 20, type: 'standard' as const })),
});

const codes = (m: MemberInput, profile: CodeProfile) =>
  profileDetailingFindings(memberModel(m, profile), '/members/0').map((f) => f.code);

describe('profileDetailingFindings: no warnings on good details', () => {
  // Staggered M20 pattern: lines at y 40 and 70 (30 mm apart), holes at x 0 and 100 on the first and
  // 50 on the second; centres hypot(50, 30) = 58.3 mm apart.
  const staggered = plate(110, [
    [0, 40],
    [100, 40],
    [50, 70],
  ]);

  it('CSA S16 22.3.1: staggered bolts on lines 40 mm apart with centres 64 mm apart pass 2.7 d = 54 (before: LG206 on p2 40)', () => {
    const m = plate(140, [
      [0, 50],
      [100, 50],
      [50, 90],
    ]);
    expect(codes(m, CSA)).toEqual([]);
    // Centres 50 mm apart along one line are below 54: still warned.
    expect(
      codes(
        plate(140, [
          [0, 50],
          [50, 50],
        ]),
        CSA,
      ),
    ).toEqual(['LG206']);
  });

  it('EN 1993-1-8 Table 3.3 note 5 (from memory): staggered p2 30 ≥ 1.2 d0 = 26.4 with L 58.3 ≥ 2.4 d0 = 52.8 (before: LG204 on p2 < 52.8)', () => {
    expect(codes(staggered, EN)).toEqual([]);
  });

  it('EN 1993-1-8 Table 3.3: an inner hole has no edge distance; the maxima (note 1, from memory) need an exposed member', () => {
    // 300 × 10 plate, M20 at y 50, 150, 250 (edges 50 mm): before, the middle hole's 150 mm to the
    // edge was read as an edge distance above 4t + 40 = 80 mm and warned (LG205).
    const wide = plate(300, [
      [0, 50],
      [0, 150],
      [0, 250],
    ]);
    expect(codes(wide, EN)).toEqual([]);
    // The minimum still holds for the holes next to an edge: e2 25 < 1.2 d0 = 26.4.
    expect(
      codes(
        plate(300, [
          [0, 25],
          [0, 150],
          [0, 250],
        ]),
        EN,
      ),
    ).toEqual(['LG204']);
  });
});
