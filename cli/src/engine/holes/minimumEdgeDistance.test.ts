import { describe, expect, it } from 'vitest';
import { minimumEdgeDistance } from './minimumEdgeDistance.js';

describe('minimumEdgeDistance (AISC 360-16 Table J3.4 / J3.4M, published)', () => {
  it.each([
    [0.5, 0.75],
    [0.625, 0.875],
    [0.75, 1],
    [0.875, 1.125],
    [1, 1.25],
    [1.125, 1.5],
    [1.25, 1.625],
  ])('gives %f in bolts %f in', (d, e) => {
    expect(minimumEdgeDistance(d, 'in')).toBe(e);
  });

  it('gives 1.25d over 1-1/4 in', () => {
    expect(minimumEdgeDistance(1.5, 'in')).toBe(1.875);
  });

  it.each([
    [16, 22],
    [20, 26],
    [22, 28],
    [24, 30],
    [27, 34],
    [30, 38],
    [36, 46],
  ])('gives M%i %i mm', (d, e) => {
    expect(minimumEdgeDistance(d, 'mm')).toBe(e);
  });

  it('gives 1.25d over M36', () => {
    expect(minimumEdgeDistance(42, 'mm')).toBe(52.5);
  });

  it('has no value for a size the table does not list', () => {
    expect(minimumEdgeDistance(0.8, 'in')).toBeUndefined();
    expect(minimumEdgeDistance(12, 'mm')).toBeUndefined();
  });

  it('AISC 360-10 sheared edges (from memory): 3/4 → 1-1/4, 1 → 1-3/4, M20 → 34 mm, 1.75 d over the table', () => {
    expect(minimumEdgeDistance(0.75, 'in', 'sheared-2010')).toBe(1.25);
    expect(minimumEdgeDistance(1, 'in', 'sheared-2010')).toBe(1.75);
    expect(minimumEdgeDistance(20, 'mm', 'sheared-2010')).toBe(34);
    expect(minimumEdgeDistance(1.5, 'in', 'sheared-2010')).toBeCloseTo(2.625, 12);
  });
});
