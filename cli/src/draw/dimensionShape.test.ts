import { describe, expect, it } from 'vitest';
import { dimensionShape } from './dimensionShape.js';
import { d9Frame as frame } from './drawing.fixtures.js';

describe('dimensionShape', () => {
  it('a gauge: a vertical line between the two y, ticks at its ends, the value read bottom to top', () => {
    const d = dimensionShape('gauge', 2, 5, 200, frame);
    expect(d.value).toBe(3);
    expect(d.label).toMatchObject({ text: '3', rotate: -90, role: 'dimension' });
    expect(d.line.from).toEqual([200, frame.Y(2)]);
    expect(d.line.to).toEqual([200, frame.Y(5)]);
    expect(d.ticks[0]).toEqual({ from: [200 - 1.4, frame.Y(2) + 1.4], to: [200 + 1.4, frame.Y(2) - 1.4] });
  });

  it('the overall width stops 2 mm short of its extension lines', () => {
    const d = dimensionShape('width', 0, 14, 210, frame);
    expect(d.label.text).toBe('14');
    expect(d.line.from[1]).toBeCloseTo(frame.Y(0) + 2, 12);
    expect(d.line.to[1]).toBeCloseTo(frame.Y(14) - 2, 12);
  });

  it('a pitch: a horizontal line between the two x, labelled as a fraction (2 1/2 in)', () => {
    const d = dimensionShape('pitch', 0, 2.5, 150, frame);
    expect(d.label).toMatchObject({ text: '2 1/2', at: [(frame.X(0) + frame.X(2.5)) / 2, 150 - 1.3] });
    expect(d.line.from).toEqual([frame.X(0) - 2, 150]);
  });
});
