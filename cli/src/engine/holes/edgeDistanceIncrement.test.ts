import { describe, expect, it } from 'vitest';
import { edgeDistanceIncrement } from './edgeDistanceIncrement.js';
import type { HoleInput } from '../types.js';

const hole = (boltDiameter: number, extra: Partial<HoleInput>): HoleInput => ({
  id: 'A',
  x: 0,
  y: 0,
  boltDiameter,
  type: 'standard',
  ...extra,
});

// AISC 360-16 Table J3.5 / J3.5M, edge distance increment C2 (from memory).
describe('edgeDistanceIncrement (AISC 360 Table J3.5, from memory)', () => {
  it('is 0 for standard holes and slots parallel to the edge', () => {
    expect(edgeDistanceIncrement(hole(0.75, {}), 'in')).toBe(0);
    expect(edgeDistanceIncrement(hole(0.75, { type: 'short-slotted', slot: 'along' }), 'in')).toBe(0);
  });

  it('inch rows: ≤ 7/8 oversized 1/16, short slot 1/8; 1 in 1/8, 1/8; ≥ 1-1/8 1/8, 3/16; long slot 0.75 d', () => {
    expect(edgeDistanceIncrement(hole(0.875, { type: 'oversized' }), 'in')).toBe(1 / 16);
    expect(edgeDistanceIncrement(hole(1, { type: 'oversized' }), 'in')).toBe(1 / 8);
    expect(edgeDistanceIncrement(hole(1.25, { type: 'short-slotted', slot: 'across' }), 'in')).toBe(3 / 16);
    expect(edgeDistanceIncrement(hole(1, { type: 'long-slotted', slot: 'across' }), 'in')).toBe(0.75);
  });

  it('metric rows: ≤ M22 2 / 3 mm, M24 3 / 3, ≥ M27 3 / 5', () => {
    expect(edgeDistanceIncrement(hole(20, { type: 'oversized' }), 'mm')).toBe(2);
    expect(edgeDistanceIncrement(hole(24, { type: 'short-slotted', slot: 'across' }), 'mm')).toBe(3);
    expect(edgeDistanceIncrement(hole(30, { type: 'short-slotted', slot: 'across' }), 'mm')).toBe(5);
  });
});
