import { describe, expect, it } from 'vitest';
import { gaugeLines } from './gaugeLines.js';
import { d9 } from './layouts.fixtures.js';
import { rankedHoles } from './rankedHoles.js';
import type { HoleLayout } from '../types.js';

describe('rankedHoles', () => {
  it('orders the D.9 holes by y, one gauge line each, with x mirrored by the sign', () => {
    const r = rankedHoles(d9, gaugeLines(d9), -1);
    expect([...r.Y]).toEqual([2, 5, 9, 12]);
    expect([...r.X]).toEqual([-0, -2.5, -2.5, -0]);
    expect([...r.W]).toEqual([0.875, 0.875, 0.875, 0.875]);
    expect([...r.lineEnd]).toEqual([1, 2, 3, 4]);
  });

  it('keeps the holes of one gauge line in consecutive ranks', () => {
    const layout: HoleLayout = {
      width: 6,
      thickness: 0.5,
      holes: [
        { id: 'P', index: 0, x: 0, y: 3, deducted: 0.875 },
        { id: 'Q', index: 1, x: 3, y: 1, deducted: 0.875 },
        { id: 'R', index: 2, x: 3, y: 3, deducted: 0.875 },
      ],
    };
    const r = rankedHoles(layout, gaugeLines(layout), 1);
    expect([...r.Y]).toEqual([1, 3, 3]);
    expect([...r.L]).toEqual([0, 1, 1]);
    expect(r.lineStart(0)).toBe(0);
    expect(r.lineStart(1)).toBe(1);
    expect(r.lineEnd[1]).toBe(3);
  });
});
