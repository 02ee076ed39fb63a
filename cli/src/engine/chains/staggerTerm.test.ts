import { describe, expect, it } from 'vitest';
import { EngineError } from '../engineError.js';
import { staggerTerm } from './staggerTerm.js';

describe('staggerTerm', () => {
  it('is s²/4g: 2.5²/(4·3) = 0.5208 (AISC Design Examples v13.0 D.9), 3²/(4·3) = 0.75 (Quimby Example 1)', () => {
    expect(staggerTerm(2.5, 3)).toBeCloseTo(0.520833, 6);
    expect(staggerTerm(3, 3)).toBe(0.75);
  });

  it('is zero without stagger and ignores the sign of s', () => {
    expect(staggerTerm(0, 4)).toBe(0);
    expect(staggerTerm(-2.5, 3)).toBe(staggerTerm(2.5, 3));
  });

  it('throws for a gauge that is not positive', () => {
    expect(() => staggerTerm(1, 0)).toThrow(EngineError);
  });
});
