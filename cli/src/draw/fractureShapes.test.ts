import { describe, expect, it } from 'vitest';
import { d9, d9Frame as frame, d9Result } from './drawing.fixtures.js';
import { fractureShapes } from './fractureShapes.js';

describe('fractureShapes', () => {
  it('D.9: A–B–C–D governs both ways, drawn once from edge to edge and labelled for both (11.542 in)', () => {
    const [f, ...rest] = fractureShapes(d9, d9Result, frame);
    expect(rest).toEqual([]);
    expect(f!.directions).toEqual(['-x', '+x']);
    expect(f!.stroke).toBe('fracture-minus');
    expect(f!.points[0]).toEqual([frame.X(0), frame.Y(0)]);
    expect(f!.points[5]).toEqual([frame.X(0), frame.Y(14)]);
    expect(f!.label.text).toBe('−x, +x: A–B–C–D · wn = 11.542 in');
  });
});
