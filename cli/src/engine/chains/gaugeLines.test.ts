import { describe, expect, it } from 'vitest';
import { gaugeLines } from './gaugeLines.js';
import type { HoleLayout } from '../types.js';

const hole = (id: string, x: number, y: number) => ({ id, index: 0, x, y, deducted: 0.875 });

describe('gaugeLines', () => {
  it('groups holes of equal y into one line, numbered from y = 0 up, each line sorted by x', () => {
    const layout: HoleLayout = {
      width: 14,
      thickness: 0.5,
      holes: [hole('C', 3, 5), hole('A', 0, 2), hole('B', 0, 5), hole('D', 0, 9)],
    };
    const lines = gaugeLines(layout);
    expect(lines.line).toEqual([1, 0, 1, 2]);
    expect(lines.order).toEqual([1, 2, 0, 3]);
    expect(lines.lines).toEqual([[1], [2, 0], [3]]);
  });

  it('treats y differing by less than the layout tolerance as one line', () => {
    const layout: HoleLayout = { width: 10, thickness: 1, holes: [hole('A', 0, 5), hole('B', 3, 5 + 1e-12)] };
    expect(gaugeLines(layout).lines).toEqual([[0, 1]]);
  });

  it('has no lines without holes', () => {
    expect(gaugeLines({ width: 10, thickness: 1, holes: [] })).toEqual({ order: [], line: [], lines: [] });
  });
});
