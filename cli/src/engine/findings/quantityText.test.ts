import { describe, expect, it } from 'vitest';
import { quantityText } from './quantityText.js';

describe('quantityText', () => {
  it('writes a stored value with the unit and precision of its file', () => {
    expect(quantityText(6.1, 'area', 'in')).toBe('6.100 in²');
    expect(quantityText(4.5625, 'area', 'in')).toBe('4.563 in²');
    expect(quantityText(3232, 'area', 'mm')).toBe('3232 mm²');
    expect(quantityText(1090.8, 'force', 'mm')).toBe('1090.8 kN');
    expect(quantityText(12, 'length', 'in')).toBe('12.000 in');
    expect(quantityText(0.9, 'ratio', 'mm')).toBe('0.900');
  });

  it('writes a dash for no value, and a bare number when quantity or units are unknown', () => {
    expect(quantityText(null, 'area', 'in')).toBe('—');
    expect(quantityText(undefined, 'force', 'mm')).toBe('—');
    expect(quantityText(4.21429, null, 'in')).toBe('4.214');
  });
});
