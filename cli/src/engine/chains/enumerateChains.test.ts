import { describe, expect, it } from 'vitest';
import { EngineError } from '../engineError.js';
import { enumerateChains } from './enumerateChains.js';
import type { PlacedHole } from '../types.js';
import { d9 } from './layouts.fixtures.js';

describe('enumerateChains', () => {
  it('lists Π(holes per line + 1) − 1 chains: 15 for D.9, ascending, the least 11.5 in (published)', () => {
    const all = enumerateChains(d9);
    expect(all).toHaveLength(15);
    for (let i = 1; i < all.length; i += 1)
      expect(all[i]!.netWidth).toBeGreaterThanOrEqual(all[i - 1]!.netWidth);
    expect(all[0]!.holes).toEqual(['A', 'B', 'C', 'D']);
    expect(Math.abs(all[0]!.netWidth - 11.5)).toBeLessThanOrEqual(0.05);
  });

  it('keeps only chains that can form under -x when asked: A-B-C-D, A-B-D, A-C-D, A-D', () => {
    expect(enumerateChains(d9, { direction: '-x' }).map((c) => c.holes.join('-'))).toEqual([
      'A-B-C-D',
      'A-C-D',
      'A-B-D',
      'A-D',
    ]);
  });

  it('counts 3 × 3 − 1 = 8 chains for two gauge lines of two holes', () => {
    const holes: PlacedHole[] = [
      { id: 'a', index: 0, x: 0, y: 3, deducted: 1 },
      { id: 'b', index: 1, x: 3, y: 3, deducted: 1 },
      { id: 'c', index: 2, x: 0, y: 7, deducted: 1 },
      { id: 'd', index: 3, x: 3, y: 7, deducted: 1 },
    ];
    expect(enumerateChains({ width: 10, thickness: 1, holes })).toHaveLength(8);
  });

  it('gives no chains without holes', () => {
    expect(enumerateChains({ width: 10, thickness: 1, holes: [] })).toEqual([]);
  });

  it('refuses a layout with more chains than the limit', () => {
    expect(() => enumerateChains(d9, { limit: 10 })).toThrow(EngineError);
    expect(() => enumerateChains(d9, { limit: 10 })).toThrow(/more than 10 chains/);
  });
});
