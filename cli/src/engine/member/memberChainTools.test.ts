import { describe, expect, it } from 'vitest';
import { braceMember, d9Member, legHole } from '../members.fixtures.js';
import type { CodeProfile } from '../types.js';
import { memberChainTools } from './memberChainTools.js';
import { memberModel } from './memberModel.js';

const AISC: CodeProfile = { standard: 'AISC 360-22', method: 'LRFD', units: 'in' };

describe('memberChainTools', () => {
  it('a plate (AISC Design Examples v13.0 D.9, conformance/SOURCES.md R1): A–B–C–D at 11.54 in (published 11.5)', () => {
    const tools = memberChainTools(memberModel(d9Member, AISC));
    const chain = tools.of(['A', 'B', 'C', 'D']);
    expect(chain.netWidth).toBeCloseTo(14 - 4 * 0.875 + (2 * 2.5 ** 2) / 12, 12);
    expect(tools.rejection(chain, '-x')).toBeNull();
    expect(tools.defect(['A', 'Z'])).toMatchObject({ reason: 'unknown-hole', position: 1 });
    // A–B runs on at x = 2.5 through C.
    expect(tools.rejection(tools.of(['A', 'B']), '-x')).toMatchObject({
      blockingHole: 'C',
      reason: 'on-line',
    });
  });

  it('a rolled shape: its chains in plate widths at the member thickness, its defects and rejections', () => {
    // L4x4x3/8 with two holes across the heel, 2.5 in from it in each leg (3/4 in bolts, 0.875 in
    // deducted): gauge 2.5 + 2.5 − 0.375 = 4.625 in, s = 3; net area Ag − 2 · 0.875 · 0.375 + 3²/(4 · 4.625) · 0.375.
    const angle = { ...braceMember, holes: [legHole('A', 0), { ...legHole('B', 3), element: 'leg-b' }] };
    const tools = memberChainTools(memberModel(angle, AISC));
    const chain = tools.of(['A', 'B']);
    const area = 2.86 - 2 * 0.875 * 0.375 + (9 / (4 * 4.625)) * 0.375;
    expect(chain.netArea).toBeCloseTo(area, 12);
    expect(chain.netWidth).toBeCloseTo(area / 0.375, 12);
    expect(chain.legs).toEqual([
      { from: 'A', to: 'B', s: 3, g: expect.closeTo(4.625, 12), term: expect.closeTo(9 / 18.5, 12) },
    ]);
    expect(tools.defect([])).toMatchObject({ reason: 'empty' });
    expect(tools.defect(['A', 'A'])).toMatchObject({ reason: 'repeated-hole', position: 1 });
    // From −x, A (x 0) lies on the loaded side of a chain through B (x 3) alone; from +x it is beyond.
    expect(tools.rejection(tools.of(['B']), '-x')).toMatchObject({
      blockingHole: 'A',
      reason: 'loaded-side',
    });
    expect(tools.rejection(tools.of(['B']), '+x')).toBeNull();
  });
});
