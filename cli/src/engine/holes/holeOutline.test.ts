import { describe, expect, it } from 'vitest';
import { holeOutline } from './holeOutline.js';

describe('holeOutline', () => {
  it('is a circle (a point swept) for a round hole', () => {
    expect(holeOutline(1, 2, 0.8125, 0.8125)).toEqual({
      a: [1, 2],
      b: [1, 2],
      radius: 0.40625,
    });
  });

  it('runs along x for a slot long along the load, along y for one long across', () => {
    expect(holeOutline(0, 5, 0.8125, 1.875)).toEqual({
      a: [-0.53125, 5],
      b: [0.53125, 5],
      radius: 0.40625,
    });
    expect(holeOutline(0, 5, 1.875, 0.8125)).toEqual({
      a: [0, 4.46875],
      b: [0, 5.53125],
      radius: 0.40625,
    });
  });
});
