import type { MemberInput } from '../engine/types.js';
import type { SheetFrame } from './sheet.js';
import { sectionStripShapes } from './sectionStrips.js';
import type { Point, Shape } from './types.js';

/** A straight end edge with the usual Z-shaped break in its middle. */
function breakLine(x: number, top: number, bottom: number): Point[] {
  const mid = (top + bottom) / 2;
  const h = Math.min(4, (bottom - top) / 6);
  return [
    [x, top],
    [x, mid - h],
    [x - 2.2, mid - h * 0.35],
    [x + 2.2, mid + h * 0.35],
    [x, mid + h],
    [x, bottom],
  ];
}

/**
 * The sheet's frame and the member's outline: the long edges solid, the ends as break lines (a calc
 * file gives no plate length, and the plate runs on into the connection at a loaded end), and for a
 * rolled shape its unfolded strips, junction lines and thicknesses ({@link sectionStripShapes}).
 *
 * @param member - the member
 * @param frame - the sheet frame
 * @returns the shapes, back to front
 * @example
 * outlineShapes(d9, frame).map((s) => s.kind) // → ['rect', 'line', 'line', 'polyline', 'polyline']
 */
export function outlineShapes(member: MemberInput, frame: SheetFrame): Shape[] {
  const { left, right, top, bottom, sheetW, sheetH } = frame;
  const shapes: Shape[] = [
    { kind: 'rect', at: [5, 5], width: sheetW - 10, height: sheetH - 10, stroke: 'frame' },
    { kind: 'line', from: [left, top], to: [right, top], stroke: 'outline' },
    { kind: 'line', from: [left, bottom], to: [right, bottom], stroke: 'outline' },
  ];
  for (const edge of [left, right])
    shapes.push({ kind: 'polyline', points: breakLine(edge, top, bottom), closed: false, stroke: 'outline' });
  if (member.section) {
    const holeYs = member.holes.map((h) => h.y);
    const holeXs = member.holes.map((h) => frame.X(h.x));
    shapes.push(
      ...sectionStripShapes(member.section, { left, right, Y: frame.Y, holeYs, holeXs }, frame.units),
    );
  }
  return shapes;
}
