import { describe, expect, it } from 'vitest';
import { netWidth } from './netWidth.js';

describe('netWidth', () => {
  it('subtracts one hole width per hole and adds s²/4g per stagger leg (Quimby Example 1: 12 − 4(0.875) + 2(0.75) = 10.00 in)', () => {
    expect(netWidth(12, [0.875, 0.875, 0.875, 0.875], [0.75, 0, 0.75])).toBeCloseTo(10.0, 2);
  });

  it('gives 228 mm for three 24 mm holes across a 300 mm plate (Holtz, Example T10)', () => {
    expect(netWidth(300, [24, 24, 24], [0, 0])).toBe(228);
  });

  it('is the gross width with no holes', () => {
    expect(netWidth(14, [], [])).toBe(14);
  });
});
