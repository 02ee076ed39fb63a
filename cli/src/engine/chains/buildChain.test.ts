import { describe, expect, it } from 'vitest';
import { buildChain } from './buildChain.js';
import type { HoleLayout } from '../types.js';

// Quimby, A Beginner's Guide to the Steel Construction Manual, Example 1 (conformance/SOURCES.md R2): PL 12 × 3/8,
// effective hole 0.875 in, a 4-hole chain with two stagger legs s = 3, g = 3. The layout beyond that
// chain is not published; the holes below are placed to give exactly those legs.
const quimby: HoleLayout = {
  width: 12,
  thickness: 0.375,
  holes: [
    { id: 'a', index: 0, x: 0, y: 1.5, deducted: 0.875 },
    { id: 'b', index: 1, x: 3, y: 4.5, deducted: 0.875 },
    { id: 'c', index: 2, x: 3, y: 7.5, deducted: 0.875 },
    { id: 'd', index: 3, x: 0, y: 10.5, deducted: 0.875 },
  ],
};

describe('buildChain', () => {
  it('gives w = 12 − 4(0.875) + 2(0.75) = 10.00 in and An = 3.75 in² (Quimby Example 1, published)', () => {
    const chain = buildChain(quimby, [0, 1, 2, 3]);
    expect(chain.netWidth).toBeCloseTo(10.0, 2);
    expect(chain.netArea).toBeCloseTo(3.75, 2);
    expect(chain.legs.map((l) => l.term)).toEqual([0.75, 0, 0.75]);
  });
});
