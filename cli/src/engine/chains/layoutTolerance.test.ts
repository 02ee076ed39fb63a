import { describe, expect, it } from 'vitest';
import { layoutTolerance } from './layoutTolerance.js';

describe('layoutTolerance', () => {
  it('is 1e-9 of the largest of width, |x|, |y| and 1', () => {
    expect(layoutTolerance({ width: 14, thickness: 0.5, holes: [] })).toBeCloseTo(1.4e-8, 20);
    expect(
      layoutTolerance({
        width: 300,
        thickness: 25,
        holes: [{ id: 'A', index: 0, x: -900, y: 75, deducted: 24 }],
      }),
    ).toBeCloseTo(9e-7, 18);
    expect(layoutTolerance({ width: 0.5, thickness: 0.1, holes: [] })).toBe(1e-9);
  });
});
