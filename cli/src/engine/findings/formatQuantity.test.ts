import { describe, expect, it } from 'vitest';
import { formatQuantity } from './formatQuantity.js';

describe('formatQuantity', () => {
  it('writes inch lengths and areas to 0.001 (a 1/16 in step shows) and kip to 0.1', () => {
    expect(formatQuantity(5.7708, 'area', 'in')).toBe('5.771 in²');
    expect(formatQuantity(11.5417, 'length', 'in')).toBe('11.542 in');
    expect(formatQuantity(0.875, 'length', 'in')).toBe('0.875 in');
    expect(formatQuantity(226.8, 'force', 'in')).toBe('226.8 kip');
    expect(formatQuantity(36, 'stress', 'in')).toBe('36.0 ksi');
  });

  it('writes mm values to 0.1 mm, whole mm², 0.1 kN and whole MPa', () => {
    expect(formatQuantity(5700, 'area', 'mm')).toBe('5700 mm²');
    expect(formatQuantity(228, 'length', 'mm')).toBe('228.0 mm');
    expect(formatQuantity(1923.75, 'force', 'mm')).toBe('1923.8 kN');
    expect(formatQuantity(350, 'stress', 'mm')).toBe('350 MPa');
  });

  it('writes ratios to 0.001 without a unit', () => {
    expect(formatQuantity(0.85, 'ratio', 'in')).toBe('0.850');
    expect(formatQuantity(0.9083, 'ratio', 'mm')).toBe('0.908');
  });

  it('leaves the unit out on request, for a column whose heading names it', () => {
    expect(formatQuantity(4.21429, 'area', 'in', { unit: false })).toBe('4.214');
    expect(formatQuantity(2987.6, 'area', 'mm', { unit: false })).toBe('2988');
  });

  it('never writes −0 and writes a value that is not finite as a dash', () => {
    expect(formatQuantity(-0.0001, 'length', 'in')).toBe('0.000 in');
    expect(formatQuantity(Number.NaN, 'force', 'mm')).toBe('—');
    expect(formatQuantity(Number.POSITIVE_INFINITY, 'area', 'in')).toBe('—');
  });
});
