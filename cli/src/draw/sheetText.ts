import type { Point, TextShape } from './types.js';

/**
 * A text on the sheet, centred on its point unless `extra` says otherwise.
 *
 * @param at - where, paper mm
 * @param value - the text
 * @param size - its size, paper mm
 * @param role - what it labels
 * @param extra - anchor, rotation, weight, italic, colour
 * @returns the text shape
 * @example
 * sheetText([10, 20], 'A', 2.3, 'hole-id', { anchor: 'start' }).anchor // → 'start'
 */
export function sheetText(
  at: Point,
  value: string,
  size: number,
  role: TextShape['role'],
  extra: Partial<TextShape> = {},
): TextShape {
  return { kind: 'text', at, text: value, size, anchor: 'middle', role, ...extra };
}
