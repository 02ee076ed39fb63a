import { describe, expect, it } from 'vitest';
import { sameHoles } from './sameHoles.js';

describe('sameHoles', () => {
  it('is true for the same ids in the same order only', () => {
    expect(sameHoles(['A', 'B', 'C'], ['A', 'B', 'C'])).toBe(true);
    expect(sameHoles(['A', 'B'], ['B', 'A'])).toBe(false);
    expect(sameHoles(['A', 'B'], ['A', 'B', 'C'])).toBe(false);
    expect(sameHoles([], [])).toBe(true);
  });
});
