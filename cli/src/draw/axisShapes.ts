import { TEXT, type SheetFrame } from './sheet.js';
import { sheetText } from './sheetText.js';
import type { Point, Shape } from './types.js';

/**
 * The small axes below the plate's left end: x along the load, y across it from the edge at y = 0
 * (cli/docs/method.md §1).
 *
 * @param frame - the sheet frame
 * @returns the two axis arrows and their letters
 * @example
 * axisShapes(frame).map((s) => s.kind) // → ['arrow', 'arrow', 'text', 'text']
 */
export function axisShapes(frame: SheetFrame): Shape[] {
  const ax: Point = [frame.left - 22, frame.bottom + 10];
  return [
    {
      kind: 'arrow',
      purpose: 'axis-x',
      tail: ax,
      head: [ax[0] + 10, ax[1]],
      headLength: 1.8,
      headWidth: 1.2,
      stroke: 'dimension',
    },
    {
      kind: 'arrow',
      purpose: 'axis-y',
      tail: ax,
      head: [ax[0], ax[1] - 10],
      headLength: 1.8,
      headWidth: 1.2,
      stroke: 'dimension',
    },
    sheetText([ax[0] + 11.5, ax[1] + 0.9], 'x', TEXT.dim, 'label', { anchor: 'start', italic: true }),
    sheetText([ax[0], ax[1] - 11.5], 'y', TEXT.dim, 'label', { anchor: 'middle', italic: true }),
  ];
}
