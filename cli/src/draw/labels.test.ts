import { describe, expect, it } from 'vitest';
import { lengthLabel, netWidthLabel } from './labels.js';

describe('lengthLabel', () => {
  it('writes inches as whole numbers and reduced sixteenths, as on a shop sketch', () => {
    expect(lengthLabel(3, 'in')).toBe('3');
    expect(lengthLabel(2.5, 'in')).toBe('2 1/2');
    expect(lengthLabel(0.8125, 'in')).toBe('13/16');
    expect(lengthLabel(1.0625, 'in')).toBe('1 1/16');
    expect(lengthLabel(12.75, 'in')).toBe('12 3/4');
  });

  it('falls back to three decimals when a length is not a sixteenth', () => {
    expect(lengthLabel(3.1, 'in')).toBe('3.100');
  });

  it('writes millimetres whole, or to one decimal', () => {
    expect(lengthLabel(75, 'mm')).toBe('75');
    expect(lengthLabel(37.5, 'mm')).toBe('37.5');
  });

  it('netWidthLabel gives the unit', () => {
    expect(netWidthLabel(11.5417, 'in')).toBe('11.542 in');
    expect(netWidthLabel(146, 'mm')).toBe('146.0 mm');
  });
});
