import { describe, expect, it } from 'vitest';
import { distinctSorted } from './distinctSorted.js';

describe('distinctSorted', () => {
  it('sorts and keeps one of values closer than eps', () => {
    expect(distinctSorted([5, 2, 5.0000001, 9], 1e-6)).toEqual([2, 5, 9]);
    expect(distinctSorted([], 1e-6)).toEqual([]);
  });
});
