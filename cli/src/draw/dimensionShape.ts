import { lengthLabel } from './labels.js';
import { TEXT, type SheetFrame } from './sheet.js';
import { sheetText } from './sheetText.js';
import type { DimensionShape, Point } from './types.js';

/** An oblique 45° tick centred on a point, as on hand-drawn dimension lines. */
function tick(p: Point, size = 1.4): { from: Point; to: Point } {
  return { from: [p[0] - size, p[1] + size], to: [p[0] + size, p[1] - size] };
}

/**
 * A dimension between two member coordinates, drawn at a paper position: a gauge or the overall
 * width across the load (a vertical line at paper x `lineAt`, from y = a to y = b, its value read
 * bottom to top; the overall width's line stops short of its extension lines), or a pitch along it (a
 * horizontal line at paper y `lineAt`, from x = a to x = b). Oblique ticks mark both ends; the label is
 * the distance in the member's units ({@link lengthLabel}).
 *
 * @param measure - `gauge` or `width` (across), `pitch` (along)
 * @param a - the lower coordinate, member units
 * @param b - the higher coordinate, member units
 * @param lineAt - the paper x (across) or y (along) of the dimension line
 * @param frame - the sheet frame
 * @returns the dimension, with no extension lines of its own
 * @example
 * dimensionShape('gauge', 2, 5, 200, frame).label.text // → '3' (inches)
 */
export function dimensionShape(
  measure: DimensionShape['measure'],
  a: number,
  b: number,
  lineAt: number,
  frame: SheetFrame,
): DimensionShape {
  const label = lengthLabel(b - a, frame.units);
  if (measure === 'pitch') {
    const p: Point = [frame.X(a), lineAt];
    const q: Point = [frame.X(b), lineAt];
    return {
      kind: 'dimension',
      measure,
      value: b - a,
      extensions: [],
      line: { from: [p[0] - 2, lineAt], to: [q[0] + 2, lineAt] },
      ticks: [tick(p), tick(q)],
      label: sheetText([(p[0] + q[0]) / 2, lineAt - 1.3], label, TEXT.dim, 'dimension'),
    };
  }
  const p: Point = [lineAt, frame.Y(a)];
  const q: Point = [lineAt, frame.Y(b)];
  const mid = (p[1] + q[1]) / 2;
  return {
    kind: 'dimension',
    measure,
    value: b - a,
    extensions: [],
    line: {
      from: [lineAt, p[1] + (measure === 'width' ? 2 : 0)],
      to: [lineAt, q[1] - (measure === 'width' ? 2 : 0)],
    },
    ticks: [tick(p), tick(q)],
    label: sheetText([lineAt - 1.3, mid], label, TEXT.dim, 'dimension', { rotate: -90, anchor: 'middle' }),
  };
}
