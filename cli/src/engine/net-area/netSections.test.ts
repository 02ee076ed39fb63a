import { describe, expect, it } from 'vitest';
import { EngineError } from '../engineError.js';
import { memberModel } from '../member/memberModel.js';
import { bolt, d9Member } from '../members.fixtures.js';
import type { CodeProfile, HoleInput, MemberInput } from '../types.js';
import { netSections } from './netSections.js';

const AISC: CodeProfile = { standard: 'AISC 360-22', method: 'LRFD', units: 'in' };
const d9 = d9Member;

describe('netSections', () => {
  it('D.9: A–B–C–D governs at 11.5 in (published), An 5.75 in² (published), Ag 7 in²', () => {
    const n = netSections(memberModel(d9, AISC), ['-x'], 10);
    expect(n.Ag).toBe(7);
    expect(n.grossArea).toBeUndefined();
    const [minus] = n.directions;
    expect(minus!.governing!.holes).toEqual(['A', 'B', 'C', 'D']);
    // Printed to 0.1 in and 0.01 in²: 14 − 4 · 0.875 + 2 · 2.5²/(4 · 3) = 11.5417 in.
    expect(Math.abs(minus!.governing!.netWidth - 11.5)).toBeLessThanOrEqual(0.05);
    expect(Math.abs(n.An - 5.75)).toBeLessThanOrEqual(0.025);
    expect(n.governingDirection).toBe('-x');
    expect(minus!.share).not.toBeNull();
  });

  it('takes the least An over the directions, the first asked for on a tie (D.9 is symmetric)', () => {
    const n = netSections(memberModel(d9, AISC), ['+x', '-x'], 1);
    expect(n.directions.map((d) => d.An)).toEqual([n.An, n.An]);
    expect(n.governingDirection).toBe('+x');
  });

  it('a rolled shape: Quimby Example 3 (conformance/SOURCES.md R5), W14x68, An 16.86 in² published, no equal-share check', () => {
    const hole = (id: string, element: string, x: number, gauge: number, d = 0.875): HoleInput => ({
      ...bolt(id, x, Number.NaN, d),
      element,
      gauge,
    });
    // As sections/sections.fixtures.ts places them: flange holes 2.75 in either side of the web, web
    // holes 0.86 in from each flange back (derived there), staggered 3 in; 7/8 in bolts deduct
    // 15/16 + 1/16 = 1.0 in (Quimby, published).
    const w: MemberInput = {
      id: 'W',
      kind: 'w-shape',
      width: 0,
      thickness: 0.72,
      material: { Fy: 50, Fu: 65 },
      directions: ['-x'],
      section: { shape: 'w-shape', d: 14, bf: 10, tf: 0.72, tw: 0.415, tabulatedAg: 20 },
      holes: [
        hole('A', 'flange-1', 0, -2.75),
        hole('B', 'flange-1', 0, 2.75),
        hole('J', 'web', 3, 0.86),
        hole('P', 'web', 3, 14 - 0.86),
        hole('S', 'flange-2', 0, -2.75),
        hole('T', 'flange-2', 0, 2.75),
      ],
    };
    const n = netSections(memberModel(w, AISC), ['-x'], 10);
    expect(n.Ag).toBe(20);
    expect(n.grossArea).toEqual({
      fromElements: expect.any(Number),
      tabulated: 20,
      used: 20,
      difference: expect.any(Number),
    });
    expect(Math.abs(n.An - 16.86)).toBeLessThanOrEqual(0.005);
    expect(n.directions[0]!.share).toBeNull();
    // Net width in plate terms at the member's thickness (the first element's, tf).
    expect(n.directions[0]!.governing!.netWidth).toBeCloseTo(n.An / 0.72, 12);
  });

  it('refuses a least chain that cuts the plate apart (rule net-area-positive)', () => {
    const cut: MemberInput = { ...d9, width: 2, holes: [bolt('A', 0, 0.5), bolt('B', 0, 1.5, 1.125)] };
    expect(() => netSections(memberModel(cut, AISC), ['-x'], 1)).toThrow(EngineError);
    expect(() => netSections(memberModel(cut, AISC), ['-x'], 1)).toThrow(/net-area-positive/);
  });
});
