import { describe, expect, it } from 'vitest';
import { chainOf } from './chainOf.js';
import { EngineError } from '../engineError.js';
import { d9 } from './layouts.fixtures.js';

// AISC Design Examples v13.0, Example D.9: plate 14 × 1/2 in, hole width 0.875 in, outer holes at
// y = 2 and 12, inner holes at y = 5 and 9 staggered 2.5 in (conformance/SOURCES.md R1).
/** A value printed to `decimals` places in a source: the engine's value must round to it. */
function expectPrinted(value: number, printed: number, decimals: number): void {
  expect(Math.abs(value - printed)).toBeLessThanOrEqual(0.5 * 10 ** -decimals + 1e-9);
}

describe('chainOf', () => {
  it('gives the published D.9 net widths 12.3, 11.5, 11.9 and 12.1 in (AISC Design Examples v13.0 D.9)', () => {
    expectPrinted(chainOf(d9, ['A', 'D']).netWidth, 12.3, 1);
    expectPrinted(chainOf(d9, ['A', 'B', 'C', 'D']).netWidth, 11.5, 1);
    expectPrinted(chainOf(d9, ['A', 'B', 'C']).netWidth, 11.9, 1);
    expectPrinted(chainOf(d9, ['A', 'C', 'D']).netWidth, 12.1, 1);
  });

  it('gives An = wn·t: 5.75 in² published for D.9 (11.5 in × 1/2, rounded)', () => {
    // The example multiplies the rounded 11.5 in by 1/2; 11.54 × 1/2 = 5.77 lies within that rounding.
    expect(Math.abs(chainOf(d9, ['A', 'B', 'C', 'D']).netArea - 5.75)).toBeLessThanOrEqual(0.05 * 0.5 + 1e-9);
  });

  it('lists each leg with s, g and s²/4g and sums deductions and stagger terms', () => {
    const chain = chainOf(d9, ['A', 'C', 'D']);
    expect(chain.legs).toEqual([
      { from: 'A', to: 'C', s: 2.5, g: 7, term: 6.25 / 28 },
      { from: 'C', to: 'D', s: 2.5, g: 3, term: 6.25 / 12 },
    ]);
    expect(chain.deducted).toBe(2.625);
    expect(chain.staggerSum).toBeCloseTo(6.25 / 28 + 6.25 / 12, 12);
  });

  it('gives a one-hole chain no legs', () => {
    expect(chainOf(d9, ['B'])).toMatchObject({ holes: ['B'], legs: [], netWidth: 13.125 });
  });

  it('throws an EngineError for a list that is not a chain', () => {
    expect(() => chainOf(d9, ['D', 'A'])).toThrow(EngineError);
    expect(() => chainOf(d9, ['X'])).toThrow(/X is not in the member/);
  });
});
