import { segmentDistance } from '../engine/geometry/segmentDistance.js';
import type { MemberInput, MemberResult } from '../engine/types.js';
import { TEXT, type SheetFrame } from './sheet.js';
import { sheetText } from './sheetText.js';
import type { FractureShape, Point, TextShape } from './types.js';

/**
 * Each hole's id at the corner of the hole farthest from the fracture lines, so no line crosses it
 * (a corner must be clearer by 0.5 mm to win over an earlier one).
 *
 * @param member - the member (its holes)
 * @param result - its analysis (nominal hole sizes)
 * @param frame - the sheet frame
 * @param fractures - the fracture lines drawn
 * @returns one label per hole, in file order
 * @example
 * holeIdLabels(d9, result, frame, fractures).map((t) => t.text) // → ['A', 'B', 'C', 'D']
 */
export function holeIdLabels(
  member: MemberInput,
  result: MemberResult,
  frame: SheetFrame,
  fractures: readonly FractureShape[],
): TextShape[] {
  const { X, Y, k } = frame;
  const widths = new Map(result.holeWidths.map((h) => [h.holeId, h]));
  const fractureSegments = fractures.flatMap((sh) =>
    sh.points.slice(1).map((p, i) => [sh.points[i]!, p] as const),
  );
  return member.holes.map((h) => {
    const w = widths.get(h.id);
    const rx = ((w?.nominalAlong ?? 0) * k) / 2;
    const ry = ((w?.nominalAcross ?? 0) * k) / 2;
    const cx = X(h.x);
    const cy = Y(h.y);
    const corners = [
      { at: [cx + rx * 0.75 + 0.8, cy - ry * 0.75 - 0.8] as Point, anchor: 'start' as const },
      { at: [cx - rx * 0.75 - 0.8, cy - ry * 0.75 - 0.8] as Point, anchor: 'end' as const },
      { at: [cx + rx * 0.75 + 0.8, cy + ry * 0.75 + 2.6] as Point, anchor: 'start' as const },
      { at: [cx - rx * 0.75 - 0.8, cy + ry * 0.75 + 2.6] as Point, anchor: 'end' as const },
    ];
    const clearance = (c: (typeof corners)[number]): number => {
      // Judge the middle of the label, not its anchor.
      const mid: Point = [c.at[0] + (c.anchor === 'start' ? 1 : -1) * h.id.length * 0.6, c.at[1] - 0.8];
      return Math.min(Infinity, ...fractureSegments.map(([a, b]) => segmentDistance(a, b, mid, mid)));
    };
    const best = corners.reduce((a, b) => (clearance(b) > clearance(a) + 0.5 ? b : a));
    return sheetText(best.at, h.id, TEXT.id, 'hole-id', { anchor: best.anchor });
  });
}
