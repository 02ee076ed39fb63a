import { describe, expect, it } from 'vitest';
import { percentDifference } from './percentDifference.js';

describe('percentDifference', () => {
  it('gives |claimed − recomputed| / |recomputed| to 0.1 %, either side', () => {
    // (6.10 − 5.7708) / 5.7708 = 5.70 %; (5.00 − 5.7708) / 5.7708 = −13.36 %.
    expect(percentDifference(6.1, 5.7708)).toBe(' by 5.7 %');
    expect(percentDifference(5, 5.7708)).toBe(' by 13.4 %');
    expect(percentDifference(-2, -1)).toBe(' by 100.0 %');
  });

  it('says nothing against a recomputed zero', () => {
    expect(percentDifference(1, 0)).toBe('');
  });
});
