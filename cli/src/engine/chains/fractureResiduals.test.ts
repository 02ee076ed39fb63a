import { describe, expect, it } from 'vitest';
import { directionSign, fractureResiduals } from './fractureResiduals.js';
import { gaugeLines } from './gaugeLines.js';
import { d9 } from './layouts.fixtures.js';

describe('fractureResiduals', () => {
  it('measures holes beyond the straight parts of the line against the end holes', () => {
    expect(fractureResiduals(d9, gaugeLines(d9), [0, 3], 1)).toEqual([NaN, 2.5, 2.5, NaN]);
    expect(fractureResiduals(d9, gaugeLines(d9), [1, 2], 1)).toEqual([-2.5, NaN, NaN, -2.5]);
  });

  it('measures a hole between two chain holes against the leg joining them', () => {
    // Leg A (0, 2) → C (2.5, 9): at y = 5 the line is at x = 2.5·3/7; B sits at 2.5.
    const r = fractureResiduals(d9, gaugeLines(d9), [0, 2, 3], 1);
    expect(r[1]).toBeCloseTo(2.5 - (2.5 * 3) / 7, 12);
  });

  it('mirrors for +x through the sign', () => {
    expect(directionSign('-x')).toBe(1);
    expect(directionSign('+x')).toBe(-1);
    expect(fractureResiduals(d9, gaugeLines(d9), [0, 3], -1)).toEqual([NaN, -2.5, -2.5, NaN]);
  });

  it('gives all NaN for an empty chain', () => {
    expect(fractureResiduals(d9, gaugeLines(d9), [], 1).every(Number.isNaN)).toBe(true);
  });
});
