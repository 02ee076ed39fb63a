import { describe, expect, it } from 'vitest';
import { d9, d9Frame as frame } from './drawing.fixtures.js';
import { outlineShapes } from './outlineShapes.js';
import type { PolylineShape } from './types.js';

describe('outlineShapes', () => {
  it('a plate: the sheet frame, the two long edges and the two break-line ends', () => {
    const shapes = outlineShapes(d9, frame);
    expect(shapes.map((s) => s.kind)).toEqual(['rect', 'line', 'line', 'polyline', 'polyline']);
    const ends = shapes.filter((s): s is PolylineShape => s.kind === 'polyline');
    expect(ends.map((e) => e.points[0])).toEqual([
      [frame.left, frame.top],
      [frame.right, frame.top],
    ]);
    expect(ends[0]!.points).toHaveLength(6);
  });

  it('a rolled shape adds its unfolded strips: an angle’s heel as a dashed line and a label per leg', () => {
    const angle = {
      ...d9,
      kind: 'angle' as const,
      width: 7.625,
      section: { shape: 'angle' as const, a: 4, b: 4, t: 0.375 },
      holes: [],
    };
    const extra = outlineShapes(angle, frame).slice(5);
    expect(extra.filter((s) => s.kind === 'text')).toHaveLength(2);
    expect(extra.some((s) => s.kind === 'line')).toBe(true);
  });
});
