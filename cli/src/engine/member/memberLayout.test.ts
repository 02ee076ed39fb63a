import { describe, expect, it } from 'vitest';
import { memberLayout } from './memberLayout.js';
import type { CodeProfile, MemberInput } from '../types.js';

const profile: CodeProfile = { standard: 'AISC 360-22', method: 'LRFD', units: 'in' };
const member: MemberInput = {
  id: 'SP-1',
  kind: 'plate',
  width: 14,
  thickness: 0.5,
  material: { Fy: 36, Fu: 58 },
  directions: ['-x'],
  holes: [
    { id: 'A1', x: 0, y: 2, boltDiameter: 0.75, type: 'standard' },
    { id: 'B1', x: 2.5, y: 5, type: 'standard', dimension: { across: 15 / 16, along: 15 / 16 } },
  ],
};

describe('memberLayout', () => {
  it('places each hole with its index and deducted width (3/4 in bolt: 0.875 in, AISC Design Examples v13.0 D.9)', () => {
    expect(memberLayout(member, profile)).toEqual({
      width: 14,
      thickness: 0.5,
      holes: [
        { id: 'A1', index: 0, x: 0, y: 2, deducted: 0.875 },
        { id: 'B1', index: 1, x: 2.5, y: 5, deducted: 1 },
      ],
    });
  });

  it('uses hole widths already computed when given', () => {
    const widths = member.holes.map((h) => ({
      holeId: h.id,
      nominalAcross: 1,
      nominalAlong: 1,
      allowance: 0,
      deducted: 1,
      source: 'explicit' as const,
    }));
    expect(memberLayout(member, profile, widths).holes.map((h) => h.deducted)).toEqual([1, 1]);
  });
});
