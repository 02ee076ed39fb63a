import { describe, expect, it } from 'vitest';
import { d9, d9Frame as frame, d9Result } from './drawing.fixtures.js';
import { holeShapes } from './holeShapes.js';
import type { CircleShape, LineShape } from './types.js';

describe('holeShapes', () => {
  const shapes = holeShapes(d9, d9Result, frame, 250, 140);

  it('centre lines first: four gauge lines out to the gauge string, two rows down to the pitch string', () => {
    const lines = shapes.filter((s): s is LineShape => s.kind === 'line');
    expect(lines).toHaveLength(6);
    expect(lines.slice(0, 4).map((l) => l.to[0])).toEqual([252, 252, 252, 252]);
    expect(lines.slice(4).map((l) => l.to[1])).toEqual([142, 142]);
    expect(shapes.slice(0, 6).every((s) => s.kind === 'line')).toBe(true);
  });

  it('the holes at their nominal 13/16 in (AISC 360-22 Table J3.3), to scale', () => {
    const circles = shapes.filter((s): s is CircleShape => s.kind === 'circle');
    expect(circles.map((c) => c.holeId)).toEqual(['A', 'B', 'C', 'D']);
    for (const c of circles) expect(c.radius).toBeCloseTo((13 / 32) * 5.08, 9);
    expect(circles[1]!.centre[0] - circles[0]!.centre[0]).toBeCloseTo(2.5 * 5.08, 9);
  });
});
