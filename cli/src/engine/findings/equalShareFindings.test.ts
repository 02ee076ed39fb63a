import { describe, expect, it } from 'vitest';
import { analyseMember } from '../analyseMember.js';
import { bolt, d9Member } from '../members.fixtures.js';
import type { CodeProfile, HoleInput, MemberInput } from '../types.js';
import { scopeOf } from './auditScope.fixtures.js';
import { equalShareFindings } from './equalShareFindings.js';

const AISC: CodeProfile = { standard: 'AISC 360-22', method: 'LRFD', units: 'in' };
// Ten 3/4 in bolts in two gauge lines (y = 3, 7) at x = 0 … 12 of a 10 × 1 plate, one more hole C at
// (−3, 5) on the loaded side, `across` wide. Hole widths 0.875 (bolts), across + 1/16 (C).
const plate = (across: number): MemberInput => ({
  ...d9Member,
  width: 10,
  thickness: 1,
  directions: ['-x'],
  holes: [
    ...[0, 3, 6, 9, 12].flatMap((x) => [bolt(`A${x}`, x, 3), bolt(`B${x}`, x, 7)]),
    { id: 'C', x: -3, y: 5, type: 'standard', dimension: { across, along: across } } satisfies HoleInput,
  ],
});

describe('equalShareFindings (cli/docs/method.md §4, by hand)', () => {
  it('LG131 when A0–B0 carrying 10 of 11 shares gives 8.25 × 11/10 = 9.075 < the full-load An 9.25 in²', () => {
    const [f] = equalShareFindings(analyseMember(plate(0.6875), AISC), scopeOf('P'));
    expect(f).toMatchObject({
      code: 'LG131',
      direction: '-x',
      chain: ['A0', 'B0'],
      pointer: '/members/0/holes',
    });
    expect(f!.recomputed).toBeCloseTo(9.075, 10);
    expect(f!.claimed).toBeCloseTo(9.25, 10);
  });

  it('nothing when C deducts 1.0 in: full-load An 9.0 in² is below 9.075', () => {
    expect(equalShareFindings(analyseMember(plate(0.9375), AISC), scopeOf('P'))).toEqual([]);
  });
});
