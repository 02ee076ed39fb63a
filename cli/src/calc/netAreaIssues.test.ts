import { describe, expect, it } from 'vitest';
import type { CodeProfile, MemberInput } from '../engine/types.js';
import { netAreaIssues } from './netAreaIssues.js';

const AISC: CodeProfile = { standard: 'AISC 360-22', method: 'LRFD', units: 'in' };

const zigzagPlate = (width: number, y0: number): MemberInput => ({
  id: 'P',
  kind: 'plate',
  width,
  thickness: 0.5,
  material: { Fy: 36, Fu: 58 },
  directions: ['-x', '+x'],
  holes: [0, 1, 2, 3].map((i) => ({
    id: 'ABCD'[i]!,
    x: i % 2 === 0 ? 0 : 0.7,
    y: y0 + 0.5 * i,
    boltDiameter: 0.75,
    type: 'standard' as const,
  })),
});

// Hole widths 13/16 + 1/16 = 7/8 in (AISC 360 Table J3.3 and B4.3b) and s²/4g credits (common practice).
describe('netAreaIssues (rule net-area-positive)', () => {
  it('reports a plate whose least chain leaves wn = 2.5 − 3.5 + 0.735 = −0.265 in', () => {
    expect(netAreaIssues(zigzagPlate(2.5, 0.5), AISC)).toEqual({
      pointer: '/holes',
      rule: 'net-area-positive',
      message:
        'chain A-B-C-D loaded from −x leaves a net width of -0.265 in (width 2.500 in − holes 3.500 in + s²/4g 0.735 in); the holes take the whole width, so it is not a tension member',
    });
  });

  it('passes the same holes in a 3-1/2 in plate (wn = 0.735 in) and a plate without holes', () => {
    expect(netAreaIssues(zigzagPlate(3.5, 1), AISC)).toBeNull();
    expect(netAreaIssues({ ...zigzagPlate(3.5, 1), holes: [] }, AISC)).toBeNull();
  });

  it('reports a section: an L3x3x1/4 with four staggered 7/8 in holes in each leg', () => {
    // Ag = (3 + 2.75) · 0.25 = 1.4375 in²; eight holes deduct 8 · 1.0 · 0.25 = 2.0 in²; six in-leg legs
    // (s 0.8, g 0.55) and one across the heel (s 0.8, g 0.8 + 0.8 − 0.25) give back 0.466 in².
    const holes = [0.8, 1.35, 1.9, 2.45].flatMap((gauge, i) => [
      { id: `A${i}`, x: i % 2 ? 0.8 : 0, y: Number.NaN, element: 'leg-a', gauge, boltDiameter: 0.875 },
      { id: `B${i}`, x: i % 2 ? 0 : 0.8, y: Number.NaN, element: 'leg-b', gauge, boltDiameter: 0.875 },
    ]);
    const angle: MemberInput = {
      id: 'L',
      kind: 'angle',
      width: 0,
      thickness: 0.25,
      material: { Fy: 36, Fu: 58 },
      directions: ['-x'],
      section: { shape: 'angle', a: 3, b: 3, t: 0.25 },
      holes: holes.map((h) => ({ ...h, type: 'standard' as const })),
    };
    const issue = netAreaIssues(angle, AISC);
    expect(issue?.rule).toBe('net-area-positive');
    expect(issue?.message).toBe(
      'chain A3-A2-A1-A0-B0-B1-B2-B3 loaded from −x leaves a net area of -0.097 in² (Ag 1.438 in² − holes 2.000 in² + s²/4g 0.466 in²); the holes take the whole section, so it is not a tension member',
    );
  });
});
