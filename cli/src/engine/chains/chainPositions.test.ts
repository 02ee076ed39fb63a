import { describe, expect, it } from 'vitest';
import { chainPositions } from './chainPositions.js';
import type { HoleLayout } from '../types.js';

const layout: HoleLayout = {
  width: 10,
  thickness: 1,
  holes: [
    { id: 'B', index: 0, x: 0, y: 7, deducted: 1 },
    { id: 'A', index: 1, x: 0, y: 3, deducted: 1 },
  ],
};

describe('chainPositions', () => {
  it('maps ids to positions in layout.holes in the order given', () => {
    expect(chainPositions(layout, ['A', 'B'])).toEqual([1, 0]);
  });

  it('throws for ids that are not a chain', () => {
    expect(() => chainPositions(layout, ['B', 'A'])).toThrow(/not a chain/);
  });
});
