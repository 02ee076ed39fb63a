import { describe, expect, it } from 'vitest';
import { formatQuantity } from './formatQuantity.js';

describe('formatQuantity', () => {
  it('writes in values with 2 decimals for lengths and areas, 1 for kip', () => {
    expect(formatQuantity(5.7708, 'area', 'in')).toBe('5.77 in²');
    expect(formatQuantity(11.5417, 'length', 'in')).toBe('11.54 in');
    expect(formatQuantity(226.8, 'force', 'in')).toBe('226.8 kip');
  });

  it('writes mm values with whole mm² and 0.1 mm and kN', () => {
    expect(formatQuantity(5700, 'area', 'mm')).toBe('5700 mm²');
    expect(formatQuantity(228, 'length', 'mm')).toBe('228.0 mm');
    expect(formatQuantity(1923.75, 'force', 'mm')).toBe('1923.8 kN');
  });

  it('writes ratios without a unit', () => {
    expect(formatQuantity(0.85, 'ratio', 'in')).toBe('0.850');
  });
});
