import { describe, expect, it } from 'vitest';
import { axisShapes } from './axisShapes.js';
import { d9Frame as frame } from './drawing.fixtures.js';
import type { ArrowShape } from './types.js';

describe('axisShapes', () => {
  it('x to the right and y up, 10 mm long, below the plate’s left end', () => {
    const shapes = axisShapes(frame);
    expect(shapes.map((s) => s.kind)).toEqual(['arrow', 'arrow', 'text', 'text']);
    const [x, y] = shapes as ArrowShape[];
    expect(x!.tail).toEqual([frame.left - 22, frame.bottom + 10]);
    expect(x!.head).toEqual([frame.left - 12, frame.bottom + 10]);
    expect(y!.head).toEqual([frame.left - 22, frame.bottom]);
  });
});
