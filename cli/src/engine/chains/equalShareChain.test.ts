import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { enumerateChains } from './enumerateChains.js';
import { fractureSides } from './fractureSides.js';
import { leastChains } from './leastChains.js';
import { equalShareChain } from './equalShareChain.js';
import type { HoleLayout, LoadDirection, PlacedHole } from '../types.js';

const hole = (id: string, x: number, y: number, deducted = 1): PlacedHole => ({
  id,
  index: 0,
  x,
  y,
  deducted,
});

// Hand-made (cli/docs/method.md §4 equal-share rule): plate 10 × 1, holes 1.0 wide.
const triangle: HoleLayout = {
  width: 10,
  thickness: 1,
  holes: [hole('A', 0, 3), hole('B', 0, 7), hole('C', 3, 5)],
};

/**
 * Two gauge lines (y = 3, 7) with five rows 3 apart: ten bolts. The straight chain through the first
 * row governs the full load: wn = 10 − 2 = 8.
 */
const rows: PlacedHole[] = [0, 3, 6, 9, 12].flatMap((x) => [hole(`A${x}`, x, 3), hole(`B${x}`, x, 7)]);
const tenBolts: HoleLayout = { width: 10, thickness: 1, holes: rows };
/** The same with one more bolt C on the loaded side of the first row, between the lines. */
const elevenBolts: HoleLayout = { width: 10, thickness: 1, holes: [...rows, hole('C', -3, 5)] };

function exhaustiveShare(layout: HoleLayout, direction: LoadDirection): number {
  const n = layout.holes.length;
  let least = Number.POSITIVE_INFINITY;
  for (const chain of enumerateChains(layout)) {
    const loaded = fractureSides(chain, layout, direction).loaded.length;
    least = Math.min(least, (chain.netArea * n) / (n - loaded));
  }
  return least;
}

describe('equalShareChain', () => {
  it('takes the chain carrying every share when it is least: A-B from -x, 8 / 1 = 8', () => {
    expect(equalShareChain(triangle, '-x')).toMatchObject({
      direction: '-x',
      chain: { holes: ['A', 'B'] },
      fastenersCarried: 3,
      fastenersTotal: 3,
      share: 1,
      equivalentArea: 8,
    });
  });

  it('divides by the share carried: from +x A-B leaves C loaded, 8 / (2/3) = 12 > 9 for C alone', () => {
    expect(equalShareChain(triangle, '+x')).toMatchObject({
      chain: { holes: ['C'] },
      fastenersCarried: 3,
      equivalentArea: 9,
    });
  });

  it('a bolt added on the loaded side raises the full-load An from 8 to 9 while the old chain still gives 8 × 11/10 = 8.8', () => {
    expect(leastChains(tenBolts, '-x', 1)[0]).toMatchObject({ holes: ['A0', 'B0'], netArea: 8 });
    expect(leastChains(elevenBolts, '-x', 1)[0]).toMatchObject({ holes: ['C'], netArea: 9 });
    const share = equalShareChain(elevenBolts, '-x')!;
    expect(share.chain.holes).toEqual(['A0', 'B0']);
    expect(share.fastenersCarried).toBe(10);
    expect(share.equivalentArea).toBeCloseTo(8.8, 12);
    expect(share.equivalentArea).toBeLessThan(9);
  });

  it('counts a hole exactly on the fracture line as carried', () => {
    const row: HoleLayout = {
      width: 12,
      thickness: 1,
      holes: [hole('P', 0, 3), hole('Q', 1, 6), hole('R', 2, 9)],
    };
    // P-R runs through Q: all three carried, but P-Q-R deducts more; the single holes leave two loaded or none.
    const all = enumerateChains(row);
    const pr = all.find((c) => c.holes.join('') === 'PR')!;
    expect(fractureSides(pr, row, '-x').onLine).toEqual(['Q']);
    expect(equalShareChain(row, '-x')!.equivalentArea).toBeCloseTo(exhaustiveShare(row, '-x'), 12);
  });

  it('gives null without holes and the straight chain for one hole', () => {
    expect(equalShareChain({ width: 10, thickness: 1, holes: [] }, '-x')).toBeNull();
    expect(equalShareChain({ width: 10, thickness: 1, holes: [hole('A', 0, 5)] }, '+x')).toMatchObject({
      equivalentArea: 9,
      share: 1,
    });
  });

  it('equals the exhaustive least netArea / share over all chains (property)', () => {
    const arb = fc
      .uniqueArray(fc.record({ x: fc.integer({ min: -6, max: 6 }), y: fc.integer({ min: 1, max: 9 }) }), {
        minLength: 1,
        maxLength: 10,
        selector: (h) => `${h.x},${h.y}`,
      })
      .map((raw): HoleLayout => ({
        width: 20,
        thickness: 0.5,
        holes: raw.map((h, i) => ({ id: `h${i}`, index: i, x: h.x / 2, y: 2 * h.y, deducted: 0.875 })),
      }));
    fc.assert(
      fc.property(arb, fc.constantFrom<LoadDirection>('-x', '+x'), (layout, direction) => {
        const fast = equalShareChain(layout, direction)!;
        const expected = exhaustiveShare(layout, direction);
        expect(Math.abs(fast.equivalentArea - expected)).toBeLessThanOrEqual(1e-9 * expected);
      }),
      { numRuns: 200 },
    );
  });
});
