import { describe, expect, it } from 'vitest';
import { d9, d9Frame as frame, d9Result } from './drawing.fixtures.js';
import { fractureShapes } from './fractureShapes.js';
import { holeIdLabels } from './holeIdLabels.js';

describe('holeIdLabels', () => {
  it('one label per hole at a corner of the hole, 13/16 in at 1:5 wide', () => {
    const labels = holeIdLabels(d9, d9Result, frame, fractureShapes(d9, d9Result, frame));
    expect(labels.map((t) => t.text)).toEqual(['A', 'B', 'C', 'D']);
    const r = (13 / 32) * 5.08 * 0.75 + 0.8;
    const a = labels[0]!;
    expect(Math.abs(a.at[0] - frame.X(0))).toBeCloseTo(r, 9);
  });

  it('without fracture lines every label takes the first corner, up and to the right', () => {
    const labels = holeIdLabels(d9, d9Result, frame, []);
    expect(labels.every((t) => t.anchor === 'start')).toBe(true);
    expect(labels[0]!.at[1]).toBeLessThan(frame.Y(2));
  });
});
