import { layoutTolerance } from './layoutTolerance.js';
import type { HoleLayout } from '../types.js';

/** Holes of a layout grouped into gauge lines (distinct y). */
export interface GaugeLines {
  /** Positions in `layout.holes`, sorted by y, then x, then position. */
  readonly order: readonly number[];
  /** Gauge line number of each hole, by position in `layout.holes`; lines are numbered from y = 0 up. */
  readonly line: readonly number[];
  /** For each line, the positions of its holes sorted by x. */
  readonly lines: readonly (readonly number[])[];
}

/**
 * Groups the holes of a layout into gauge lines: holes whose y differ by no more than
 * {@link layoutTolerance} share a line (cli/docs/method.md §1: holes on the same y form a gauge line).
 *
 * @param layout - the holes and plate
 * @returns the sort order, each hole's line number and the holes of each line
 * @example
 * // holes at y = 2, 5, 5, 9 → lines 0, 1, 1, 2
 * gaugeLines(layout).line // → [0, 1, 1, 2]
 */
export function gaugeLines(layout: HoleLayout): GaugeLines {
  const holes = layout.holes;
  const eps = layoutTolerance(layout);
  const order = holes.map((_, i) => i);
  order.sort((a, b) => {
    const ha = holes[a]!;
    const hb = holes[b]!;
    return ha.y - hb.y || ha.x - hb.x || a - b;
  });
  const line = new Array<number>(holes.length).fill(0);
  const lines: number[][] = [];
  let previousY = Number.NEGATIVE_INFINITY;
  for (const p of order) {
    const y = holes[p]!.y;
    if (lines.length === 0 || y - previousY > eps) lines.push([]);
    lines[lines.length - 1]!.push(p);
    line[p] = lines.length - 1;
    previousY = y;
  }
  return { order, line, lines };
}
