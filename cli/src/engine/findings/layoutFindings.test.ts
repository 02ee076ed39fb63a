import { describe, expect, it } from 'vitest';
import { memberModel } from '../member/memberModel.js';
import { bolt, braceMember, d9Member, legHole } from '../members.fixtures.js';
import type { CodeProfile } from '../types.js';
import { scopeOf } from './auditScope.fixtures.js';
import { layoutFindings } from './layoutFindings.js';

const AISC: CodeProfile = { standard: 'AISC 360-22', method: 'LRFD', units: 'in' };

describe('layoutFindings', () => {
  it('LG301 for a hole whose outline reaches past an edge: a 13/16 in hole centred 0.3 in from y = 0', () => {
    const m = { ...d9Member, holes: [bolt('A', 0, 0.3), bolt('B', 0, 7)] };
    expect(layoutFindings(memberModel(m, AISC), scopeOf('D9'))).toEqual([
      expect.objectContaining({ code: 'LG301', holes: ['A'], pointer: '/members/0/holes/0', memberId: 'D9' }),
    ]);
  });

  it('LG303 for a repeated hole id, at the second hole’s id', () => {
    const m = { ...d9Member, holes: [bolt('A', 0, 2), bolt('A', 0, 12)] };
    expect(layoutFindings(memberModel(m, AISC), scopeOf('D9')).map((f) => [f.code, f.pointer])).toEqual([
      ['LG303', '/members/0/holes/1/id'],
    ]);
  });

  it('a section member: no LG301 or LG302 (its holes are placed by element and gauge; the loader reports LG304)', () => {
    // y past the unfolded width would be LG301 on a plate.
    const m = { ...braceMember, holes: [{ ...legHole('A1', 0), y: 20 }, legHole('A2', 3)] };
    expect(layoutFindings(memberModel(m, AISC), scopeOf('B'))).toEqual([]);
  });

  it('nothing for the D.9 layout (AISC Design Examples v13.0 D.9)', () => {
    expect(layoutFindings(memberModel(d9Member, AISC), scopeOf('D9'))).toEqual([]);
  });
});
