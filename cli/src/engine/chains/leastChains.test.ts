import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { EngineError } from '../engineError.js';
import { enumerateChains } from './enumerateChains.js';
import { leastChains } from './leastChains.js';
import type { Chain, HoleLayout, LoadDirection, PlacedHole } from '../types.js';
import { d9 } from './layouts.fixtures.js';

/** Random patterns of up to 12 holes on a half-unit grid (collinear and same-line cases are common). */
const layoutArb: fc.Arbitrary<HoleLayout> = fc
  .uniqueArray(
    fc.record({
      x: fc.integer({ min: -8, max: 8 }),
      y: fc.integer({ min: 1, max: 11 }),
      w: fc.integer({ min: 2, max: 4 }),
    }),
    { minLength: 0, maxLength: 12, selector: (h) => `${h.x},${h.y}` },
  )
  .map((raw) => ({
    width: 24,
    thickness: 0.5,
    holes: raw.map((h, i): PlacedHole => ({
      id: `h${i}`,
      index: i,
      x: h.x / 2,
      y: 2 * h.y,
      deducted: h.w / 4,
    })),
  }));

const DIRECTIONS: readonly (LoadDirection | null)[] = ['-x', '+x', null];
const close = (a: number, b: number): boolean => Math.abs(a - b) <= 1e-9 * Math.max(1, Math.abs(a));
const widths = (chains: readonly Chain[]): number[] => chains.map((c) => c.netWidth);

describe('leastChains', () => {
  it('finds the D.9 zigzag 11.5 in as governing under -x, then 12.1, 12.1, 12.3 (AISC Design Examples v13.0 D.9)', () => {
    const least = leastChains(d9, '-x', 4);
    expect(least.map((c) => c.holes.join('-'))).toEqual(['A-B-C-D', 'A-B-D', 'A-C-D', 'A-D']);
    const printed = [11.5, 12.1, 12.1, 12.3];
    least.forEach((c, i) => expect(Math.abs(c.netWidth - printed[i]!)).toBeLessThanOrEqual(0.05 + 1e-9));
  });

  it('gives An = 5.75 in² published for D.9 within the printed rounding', () => {
    expect(Math.abs(leastChains(d9, '-x', 1)[0]!.netArea - 5.75)).toBeLessThanOrEqual(0.025 + 1e-9);
  });

  it('without a direction ranks every chain, so A-B-C (11.9 in, published) comes second', () => {
    expect(leastChains(d9, null, 2).map((c) => c.holes.join('-'))).toEqual(['A-B-C-D', 'A-B-C']);
  });

  it('returns an empty list for a layout without holes', () => {
    expect(leastChains({ width: 10, thickness: 1, holes: [] }, '-x')).toEqual([]);
  });

  it('returns the straight chain through a single hole', () => {
    const one: HoleLayout = {
      width: 10,
      thickness: 1,
      holes: [{ id: 'A', index: 0, x: 4, y: 5, deducted: 1 }],
    };
    expect(leastChains(one, '+x')).toMatchObject([{ holes: ['A'], netWidth: 9, netArea: 9 }]);
  });

  it('does not take a chain whose line runs exactly through a hole it skips (collinear holes)', () => {
    const row: HoleLayout = {
      width: 12,
      thickness: 0.5,
      holes: [
        { id: 'P', index: 0, x: 0, y: 3, deducted: 0.875 },
        { id: 'Q', index: 1, x: 1, y: 6, deducted: 0.875 },
        { id: 'R', index: 2, x: 2, y: 9, deducted: 0.875 },
      ],
    };
    const chains = leastChains(row, '-x', 20).map((c) => c.holes.join('-'));
    expect(chains).not.toContain('P-R');
    expect(chains).toContain('P-Q-R');
    expect(chains).toEqual(enumerateChains(row, { direction: '-x' }).map((c) => c.holes.join('-')));
  });

  it('throws for a k that is not a positive integer', () => {
    expect(() => leastChains(d9, '-x', 0)).toThrow(EngineError);
    expect(() => leastChains(d9, '-x', 1.5)).toThrow(/k must be a positive integer/);
  });

  it('equals the exhaustive search for the least chain in every direction and without one (property)', () => {
    fc.assert(
      fc.property(layoutArb, (layout) => {
        for (const direction of DIRECTIONS) {
          const fast = leastChains(layout, direction, 1);
          const all = enumerateChains(layout, { direction });
          expect(fast.length).toBe(all.length > 0 ? 1 : 0);
          if (all.length > 0) expect(close(fast[0]!.netWidth, all[0]!.netWidth)).toBe(true);
        }
      }),
      { numRuns: 200 },
    );
  });

  it('gives the k least sorted ascending, distinct, with the same widths as the exhaustive k least (property)', () => {
    fc.assert(
      fc.property(
        layoutArb,
        fc.integer({ min: 1, max: 12 }),
        fc.constantFrom(...DIRECTIONS),
        (layout, k, direction) => {
          const fast = leastChains(layout, direction, k);
          const all = enumerateChains(layout, { direction });
          expect(fast.length).toBe(Math.min(k, all.length));
          const keys = new Set(fast.map((c) => c.holes.join(',')));
          expect(keys.size).toBe(fast.length);
          for (let i = 1; i < fast.length; i += 1)
            expect(fast[i]!.netWidth).toBeGreaterThanOrEqual(fast[i - 1]!.netWidth);
          widths(fast).forEach((w, i) => expect(close(w, all[i]!.netWidth)).toBe(true));
        },
      ),
      { numRuns: 200 },
    );
  });

  it('swaps the two directions when the plate is mirrored, x → −x (property)', () => {
    fc.assert(
      fc.property(layoutArb, (layout) => {
        const mirrored: HoleLayout = { ...layout, holes: layout.holes.map((h) => ({ ...h, x: -h.x })) };
        expect(widths(leastChains(mirrored, '+x', 5))).toEqual(widths(leastChains(layout, '-x', 5)));
        expect(widths(leastChains(mirrored, '-x', 5))).toEqual(widths(leastChains(layout, '+x', 5)));
      }),
      { numRuns: 200 },
    );
  });

  it('never increases the least net width over all chains when a hole is added (property)', () => {
    fc.assert(
      fc.property(
        layoutArb,
        fc.integer({ min: -8, max: 8 }),
        fc.integer({ min: 1, max: 11 }),
        (layout, x, y) => {
          if (layout.holes.some((h) => h.x === x / 2 && h.y === 2 * y)) return;
          const before = leastChains(layout, null, 1)[0]?.netWidth ?? layout.width;
          const added: HoleLayout = {
            ...layout,
            holes: [
              ...layout.holes,
              { id: 'new', index: layout.holes.length, x: x / 2, y: 2 * y, deducted: 0.75 },
            ],
          };
          expect(leastChains(added, null, 1)[0]!.netWidth).toBeLessThanOrEqual(before + 1e-9);
        },
      ),
      { numRuns: 200 },
    );
  });
});
