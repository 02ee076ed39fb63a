import { describe, expect, it } from 'vitest';
import { chainDefect } from './chainDefect.js';
import type { HoleLayout } from '../types.js';

const layout: HoleLayout = {
  width: 14,
  thickness: 0.5,
  holes: [
    { id: 'A1', index: 0, x: 0, y: 2, deducted: 0.875 },
    { id: 'B1', index: 1, x: 2.5, y: 5, deducted: 0.875 },
    { id: 'C1', index: 2, x: 5, y: 5, deducted: 0.875 },
  ],
};

describe('chainDefect', () => {
  it('accepts holes in increasing y, one per gauge line, lines may be skipped', () => {
    expect(chainDefect(layout, ['A1', 'B1'])).toBeNull();
    expect(chainDefect(layout, ['C1'])).toBeNull();
  });

  it('names an unknown hole, a repeated hole, two holes on one gauge line, holes out of y order, an empty list', () => {
    expect(chainDefect(layout, ['A1', 'Z9'])).toMatchObject({
      reason: 'unknown-hole',
      position: 1,
      holeId: 'Z9',
    });
    expect(chainDefect(layout, ['A1', 'A1'])).toMatchObject({ reason: 'repeated-hole', position: 1 });
    expect(chainDefect(layout, ['A1', 'B1', 'C1'])).toMatchObject({
      reason: 'same-gauge-line',
      position: 2,
      holeId: 'C1',
    });
    expect(chainDefect(layout, ['B1', 'A1'])).toMatchObject({
      reason: 'out-of-order',
      position: 1,
      holeId: 'A1',
    });
    expect(chainDefect(layout, [])).toMatchObject({ reason: 'empty', position: 0 });
  });
});
