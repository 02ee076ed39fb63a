import { describe, expect, it } from 'vitest';
import { unitSymbol } from './unitSymbol.js';

describe('unitSymbol', () => {
  it('names the unit of each dimension in both unit systems (calc schema: in, in², ksi, kip; mm, mm², MPa, kN)', () => {
    expect(['length', 'area', 'force', 'stress'].map((d) => unitSymbol(d as 'length', 'in'))).toEqual([
      'in',
      'in²',
      'kip',
      'ksi',
    ]);
    expect(['length', 'area', 'force', 'stress'].map((d) => unitSymbol(d as 'length', 'mm'))).toEqual([
      'mm',
      'mm²',
      'kN',
      'MPa',
    ]);
  });

  it('gives no unit for a ratio', () => {
    expect(unitSymbol('ratio', 'in')).toBe('');
    expect(unitSymbol('ratio', 'mm')).toBe('');
  });
});
