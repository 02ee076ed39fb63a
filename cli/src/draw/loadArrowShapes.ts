import type { MemberInput, MemberResult } from '../engine/types.js';
import { distinctSorted } from './distinctSorted.js';
import { DIR_TEXT, TEXT, type SheetFrame } from './sheet.js';
import { sheetText } from './sheetText.js';
import type { Shape } from './types.js';

/**
 * The load arrows at the loaded end(s), one per direction analysed, placed in the (up to three) widest
 * gaps between gauge lines so no arrow sits on a centre line, each end labelled `T (−x)` or `T (+x)`.
 *
 * @param member - the member (its gauge lines)
 * @param result - its analysis (the directions)
 * @param frame - the sheet frame
 * @returns per direction its arrows, then its label
 * @example
 * // D.9 loaded from −x: arrows in the 4 in gap and the two 3 in gaps, at the left end
 * loadArrowShapes(d9, result, frame).filter((s) => s.kind === 'arrow').length // → 3
 */
export function loadArrowShapes(member: MemberInput, result: MemberResult, frame: SheetFrame): Shape[] {
  const { W, eps, left, right, Y } = frame;
  const stops = distinctSorted(
    [
      0,
      ...distinctSorted(
        member.holes.map((h) => h.y),
        eps,
      ),
      W,
    ],
    eps,
  );
  const gaps = stops
    .slice(0, -1)
    .map((a, i) => ({ mid: (a + stops[i + 1]!) / 2, size: stops[i + 1]! - a }))
    .sort((p, q) => q.size - p.size)
    .slice(0, 3)
    .map((g) => g.mid)
    .sort((a, b) => a - b);
  const arrowYs = gaps.length > 0 ? gaps : [W / 2];
  const shapes: Shape[] = [];
  for (const direction of new Set(result.directions.map((d) => d.direction))) {
    const edge = direction === '-x' ? left : right;
    const sign = direction === '-x' ? -1 : 1;
    for (const y of arrowYs) {
      shapes.push({
        kind: 'arrow',
        purpose: 'load',
        direction,
        tail: [edge + sign * 3.5, Y(y)],
        head: [edge + sign * 16, Y(y)],
        headLength: 3,
        headWidth: 1.8,
        stroke: 'load',
      });
    }
    const labelY = Y(arrowYs[arrowYs.length - 1]!) - 2.2;
    shapes.push(
      sheetText([edge + sign * 9.5, labelY], `T (${DIR_TEXT[direction]})`, TEXT.label, 'load', {
        anchor: 'middle',
      }),
    );
  }
  return shapes;
}
