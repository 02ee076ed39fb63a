import { describe, expect, it } from 'vitest';
import { d9, d9Frame as frame, d9Result } from './drawing.fixtures.js';
import { loadArrowShapes } from './loadArrowShapes.js';
import type { ArrowShape, TextShape } from './types.js';

describe('loadArrowShapes', () => {
  it('D.9 from both ends: three arrows per end in the widest gaps (4 in at y 7, the 3 in gaps at 3.5 and 10.5), each end labelled', () => {
    const shapes = loadArrowShapes(d9, d9Result, frame);
    const arrows = shapes.filter((s): s is ArrowShape => s.kind === 'arrow');
    expect(arrows.map((a) => a.direction)).toEqual(['-x', '-x', '-x', '+x', '+x', '+x']);
    expect(arrows.slice(0, 3).map((a) => a.tail[1])).toEqual([frame.Y(3.5), frame.Y(7), frame.Y(10.5)]);
    expect(arrows[0]!.head[0]).toBeCloseTo(frame.left - 16, 12);
    expect(arrows[3]!.head[0]).toBeCloseTo(frame.right + 16, 12);
    expect(shapes.filter((s): s is TextShape => s.kind === 'text').map((t) => t.text)).toEqual([
      'T (−x)',
      'T (+x)',
    ]);
  });
});
