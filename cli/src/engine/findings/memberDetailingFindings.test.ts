import { describe, expect, it } from 'vitest';
import { analyseModel } from '../analyseModel.js';
import { memberModel } from '../member/memberModel.js';
import { bolt, d9Member } from '../members.fixtures.js';
import type { CodeProfile, MemberInput } from '../types.js';
import { memberDetailingFindings } from './memberDetailingFindings.js';

const AISC: CodeProfile = { standard: 'AISC 360-22', method: 'LRFD', units: 'in' };
const EN: CodeProfile = { standard: 'EN 1993-1-1', method: 'LRFD', units: 'mm' };
const detail = (m: MemberInput, profile: CodeProfile) => {
  const model = memberModel(m, profile);
  return memberDetailingFindings(model, analyseModel(model), '/members/0').map((f) => f.code);
};

describe('memberDetailingFindings', () => {
  it('AISC 360 J3.3 on a plate: 3/4 in bolts 1.75 in apart, below 2-2/3 · 0.75 = 2.00 in (LG201)', () => {
    expect(detail({ ...d9Member, holes: [bolt('A', 0, 5), bolt('B', 0, 6.75)] }, AISC)).toEqual(['LG201']);
  });

  it('EN 1993-1-8 Table 3.3 under the EN profile: M20 (d0 22) 40 mm apart along the load, p1 < 2.2 d0 = 48.4 (LG204)', () => {
    const plate: MemberInput = {
      ...d9Member,
      width: 200,
      thickness: 10,
      material: { Fy: 355, Fu: 490 },
      directions: ['-x'],
      holes: [bolt('A', 0, 100, 20), bolt('B', 40, 100, 20)],
    };
    expect(detail(plate, EN)).toEqual(['LG204']);
  });

  it('nothing for D.9 (AISC Design Examples v13.0 D.9 geometry)', () => {
    expect(detail(d9Member, AISC)).toEqual([]);
  });
});
