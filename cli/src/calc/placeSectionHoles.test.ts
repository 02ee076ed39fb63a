import { describe, expect, it } from 'vitest';
import { angle } from '../engine/sections/angle.js';
import type { HoleInput } from '../engine/types.js';
import type { SemanticIssue } from './normaliseTypes.js';
import { placeSectionHoles } from './placeSectionHoles.js';

const hole = (id: string, element: string, gauge: number): HoleInput => ({
  id,
  x: 0,
  y: Number.NaN,
  element,
  gauge,
  boltDiameter: 0.75,
  type: 'standard',
});

describe('placeSectionHoles', () => {
  it('L4x4x1/2 unfolds to a + b − t = 7.5 in; holes 2.5 in from the heel sit 1.5 in and 6.0 in from leg a’s toe', () => {
    // AISC 360 B4.3b: the gauge across the heel is 2.5 + 2.5 − 0.5 = 4.5 in = 6.0 − 1.5.
    const issues: SemanticIssue[] = [];
    const placed = placeSectionHoles(
      angle(4, 4, 0.5),
      [hole('A', 'leg-a', 2.5), hole('B', 'leg-b', 2.5)],
      '/members/0',
      issues,
    );
    expect(placed.width).toBeCloseTo(7.5, 12);
    expect(placed.thickness).toBe(0.5);
    expect(placed.holes.map((h) => h.y)).toEqual([expect.closeTo(1.5, 12), expect.closeTo(6, 12)]);
    expect(issues).toEqual([]);
  });

  it('hole-outside-element for an unknown element or a gauge past the toe; those holes keep their y', () => {
    const issues: SemanticIssue[] = [];
    const placed = placeSectionHoles(
      angle(4, 4, 0.5),
      [hole('A', 'flange', 2.5), hole('B', 'leg-b', 4.5)],
      '/members/2',
      issues,
    );
    expect(issues.map((i) => [i.pointer, i.rule])).toEqual([
      ['/members/2/holes/0/element', 'hole-outside-element'],
      ['/members/2/holes/1/gauge', 'hole-outside-element'],
    ]);
    expect(placed.holes.every((h) => Number.isNaN(h.y))).toBe(true);
  });
});
