import { describe, expect, it } from 'vitest';
import { analyseMember } from './analyseMember.js';
import { analyseModel } from './analyseModel.js';
import { memberModel } from './member/memberModel.js';
import { d9Member } from './members.fixtures.js';
import type { CodeProfile, MemberInput } from './types.js';

const LRFD: CodeProfile = { standard: 'AISC 360-22', method: 'LRFD', units: 'in' };

// D.9 with a required strength.
const d9: MemberInput = { ...d9Member, directions: ['-x'], requiredStrength: 150 };

describe('analyseModel', () => {
  it('D.9: Ag 7 in², An 5.75 in² (published), yielding 0.90 · 36 · 7, rupture 0.75 · 58 · An; utilisation against the least', () => {
    const model = memberModel(d9, LRFD);
    const r = analyseModel(model);
    expect(r.Ag).toBe(7);
    expect(Math.abs(r.An - 5.75)).toBeLessThanOrEqual(0.025);
    expect(r.Ae).toBe(r.An);
    expect(r.yielding.available).toBeCloseTo(226.8, 9);
    expect(r.rupture.available).toBeCloseTo(0.75 * 58 * r.An, 9);
    expect(r.governing.limitState).toBe('yielding');
    expect(r.utilisation).toBeCloseTo(150 / 226.8, 9);
    // The model's hole widths are the result's, not a copy made again.
    expect(r.holeWidths).toBe(model.holeWidths);
  });

  it('k and directions come from the options', () => {
    const r = analyseModel(memberModel(d9, LRFD), { k: 2, directions: ['+x'] });
    expect(r.directions.map((d) => [d.direction, d.leastChains.length])).toEqual([['+x', 2]]);
  });

  it('is what analyseMember gives, analyseMember building the model from the input', () => {
    expect(analyseMember(d9, LRFD, { k: 3 })).toEqual(analyseModel(memberModel(d9, LRFD), { k: 3 }));
  });
});
