import { describe, expect, it } from 'vitest';
import { DEFAULT_TOLERANCE, withinTolerance } from './withinTolerance.js';

describe('withinTolerance', () => {
  it('accepts 0.5 % relative by default: 5.75 vs 5.7708 (0.36 %), not 6.10', () => {
    expect(DEFAULT_TOLERANCE).toEqual({ relative: 0.005 });
    expect(withinTolerance(5.75, 5.7708, 'area')).toBe(true);
    expect(withinTolerance(6.1, 5.7708, 'area')).toBe(false);
  });

  it('accepts exactly at the limit', () => {
    expect(withinTolerance(100.5, 100, 'force')).toBe(true);
  });

  it('uses the absolute tolerance of the dimension instead when given', () => {
    const t = { relative: 0.5, absolute: { area: 0.01 } };
    expect(withinTolerance(5.75, 5.7708, 'area', t)).toBe(false);
    expect(withinTolerance(5.765, 5.7708, 'area', t)).toBe(true);
    // Other dimensions keep the relative tolerance.
    expect(withinTolerance(140, 100, 'force', t)).toBe(true);
  });

  it('compares ratios relatively even when absolute tolerances are given', () => {
    expect(withinTolerance(0.9, 1, 'ratio', { relative: 0.005, absolute: { length: 1 } })).toBe(false);
  });
});
