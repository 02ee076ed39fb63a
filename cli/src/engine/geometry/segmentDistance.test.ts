import { describe, expect, it } from 'vitest';
import { segmentDistance } from './segmentDistance.js';

const p = (x: number, y: number) => [x, y] as const;

describe('segmentDistance', () => {
  it('is the gap between two apart segments', () => {
    expect(segmentDistance(p(0, 0), p(2, 0), p(1, 3), p(1, 1))).toBe(1);
  });

  it('is zero for crossing segments', () => {
    expect(segmentDistance(p(0, 0), p(2, 2), p(0, 2), p(2, 0))).toBe(0);
  });

  it('is the distance between two points when both segments are points (3-4-5)', () => {
    expect(segmentDistance(p(0, 0), p(0, 0), p(3, 4), p(3, 4))).toBe(5);
  });

  it('is the perpendicular distance from a point to a segment', () => {
    expect(segmentDistance(p(0, 0), p(0, 10), p(2, 5), p(2, 5))).toBe(2);
  });
});
