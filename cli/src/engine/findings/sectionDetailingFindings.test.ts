import { describe, expect, it } from 'vitest';
import { memberModel } from '../member/memberModel.js';
import { braceMember, legHole } from '../members.fixtures.js';
import type { CodeProfile, MemberInput } from '../types.js';
import { sectionDetailingFindings } from './sectionDetailingFindings.js';

const AISC: CodeProfile = { standard: 'AISC 360-22', method: 'LRFD', units: 'in' };
const detail = (m: MemberInput) => sectionDetailingFindings(memberModel(m, AISC), '/members/0');

describe('sectionDetailingFindings (AISC 360, within each element)', () => {
  it('nothing for the L4x4x3/8 brace: 3 in pitch, 1.5 in to the toe (Table J3.4: 1 in for 3/4 in bolts)', () => {
    expect(detail(braceMember)).toEqual([]);
  });

  it('LG201 for 3/4 in bolts 1.5 in apart, below 2-2/3 · 0.75 = 2.00 in (J3.3), pointing at the later hole', () => {
    const [f] = detail({ ...braceMember, holes: [legHole('A1', 0), legHole('A2', 1.5)] });
    expect(f).toMatchObject({
      code: 'LG201',
      holes: ['A1', 'A2'],
      claimed: 1.5,
      pointer: '/members/0/holes/1',
    });
    expect(f!.recomputed).toBeCloseTo(2, 12);
  });

  it('LG202 for a hole 3.25 in from the heel: 4 − 3.25 = 0.75 in to the toe, below 1 in (J3.4); the heel is no edge', () => {
    const [f] = detail({ ...braceMember, holes: [legHole('A1', 0, 3.25)] });
    expect(f).toMatchObject({ code: 'LG202', holes: ['A1'], pointer: '/members/0/holes/0/gauge' });
    expect(f!.claimed).toBeCloseTo(0.75, 12);
    expect(detail({ ...braceMember, holes: [legHole('A1', 0, 0.9)] })).toEqual([]);
  });
});
