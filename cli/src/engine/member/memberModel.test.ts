import { describe, expect, it } from 'vitest';
import { EngineError } from '../engineError.js';
import { d9 as d9Layout } from '../chains/layouts.fixtures.js';
import { bolt, d9Member } from '../members.fixtures.js';
import type { CodeProfile, MemberInput } from '../types.js';
import { memberModel } from './memberModel.js';

const AISC: CodeProfile = { standard: 'AISC 360-22', method: 'LRFD', units: 'in' };
const EN: CodeProfile = { standard: 'EN 1993-1-1', method: 'LRFD', units: 'mm' };

const d9 = d9Member;
// L4x4x1/2 with a hole 2.5 in from the heel in each leg; tabulated Ag 3.75 in² (AISC Manual, from memory).
const angleMember: MemberInput = {
  id: 'L',
  kind: 'angle',
  width: 7.5,
  thickness: 0.5,
  material: { Fy: 36, Fu: 58 },
  directions: ['-x'],
  section: { shape: 'angle', a: 4, b: 4, t: 0.5, tabulatedAg: 3.75 },
  holes: [
    { ...bolt('A', 0, Number.NaN), element: 'leg-a', gauge: 2.5 },
    { ...bolt('B', 1.5, Number.NaN), element: 'leg-b', gauge: 2.5 },
  ],
};

describe('memberModel', () => {
  it('a plate: every hole with the width it deducts (13/16 + 1/16 in, AISC 360 J3.3 and B4.3b) in one layout', () => {
    const model = memberModel(d9, AISC);
    expect(model.unfolded).toBeUndefined();
    expect(model.holeWidths.map((w) => w.deducted)).toEqual([0.875, 0.875, 0.875, 0.875]);
    // The D.9 layout as chains/layouts.fixtures.ts writes it out by hand.
    expect(model.layout).toEqual(d9Layout);
  });

  it('a rolled shape: unfolded once, the gauge across the heel ga + gb − t (AISC 360 B4.3b), the tabulated Ag used', () => {
    const model = memberModel(angleMember, AISC);
    if (!model.unfolded) throw new Error('expected a section model');
    expect(model.layout).toBeUndefined();
    expect(model.unfolded.gauges[0]![1]).toBeCloseTo(2.5 + 2.5 - 0.5, 12);
    expect(model.unfolded.holes.map((h) => h.element)).toEqual(['leg-a', 'leg-b']);
    // Elements: (4 + 4 − 0.5) · 0.5 = 3.75 in², the same as tabulated here.
    expect(model.grossArea).toEqual({ fromElements: 3.75, tabulated: 3.75, used: 3.75, difference: 0 });
  });

  it('takes the hole widths of the file’s code: EN 1993-1-1 deducts d0 itself (M20 in a 22 mm hole)', () => {
    const plate: MemberInput = {
      ...d9,
      width: 200,
      thickness: 10,
      holes: [{ id: 'A', x: 0, y: 100, boltDiameter: 20, type: 'standard' }],
    };
    expect(memberModel(plate, EN).layout!.holes[0]!.deducted).toBe(22);
  });

  it('refuses a section member’s hole without element or gauge', () => {
    const { element, ...loose } = angleMember.holes[0]!;
    void element;
    expect(() => memberModel({ ...angleMember, holes: [loose] }, AISC)).toThrow(EngineError);
    expect(() => memberModel({ ...angleMember, holes: [loose] }, AISC)).toThrow(/need element and gauge/);
  });
});
