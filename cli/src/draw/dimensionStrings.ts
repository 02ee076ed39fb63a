import type { MemberInput } from '../engine/types.js';
import { dimensionShape } from './dimensionShape.js';
import { distinctSorted } from './distinctSorted.js';
import type { SheetFrame } from './sheet.js';
import type { DimensionShape, Point } from './types.js';

/**
 * The dimension strings: gauges from edge to edge through every gauge line at paper x `gaugeAt`, the
 * overall width outside them at `widthAt` (it carries the plate edges' extension lines, which the
 * gauge string shares), and the pitches between rows of holes below the plate at paper y `pitchAt`.
 *
 * @param member - the member
 * @param frame - the sheet frame
 * @param at - paper positions of the gauge, width and pitch strings
 * @returns the gauge dimensions, the width, then the pitches
 * @example
 * // D.9 (gauges 2, 3, 4, 3, 2 in)
 * dimensionStrings(d9, frame, at).filter((d) => d.measure === 'gauge').map((d) => d.label.text) // → ['2', '3', '4', '3', '2']
 */
export function dimensionStrings(
  member: MemberInput,
  frame: SheetFrame,
  at: { readonly gaugeAt: number; readonly widthAt: number; readonly pitchAt: number },
): DimensionShape[] {
  const { W, eps, right, Y } = frame;
  const gaugeYs = distinctSorted(
    member.holes.map((h) => h.y),
    eps,
  );
  const pitchXs = distinctSorted(
    member.holes.map((h) => h.x),
    eps,
  );
  const stops = distinctSorted([0, ...gaugeYs, W], eps);
  const shapes: DimensionShape[] = [];
  for (let i = 0; i + 1 < stops.length; i += 1) {
    shapes.push(dimensionShape('gauge', stops[i]!, stops[i + 1]!, at.gaugeAt, frame));
  }
  shapes.push({
    ...dimensionShape('width', 0, W, at.widthAt, frame),
    extensions: [0, W].map((y) => ({
      from: [right + 1.5, Y(y)] as Point,
      to: [at.widthAt + 2, Y(y)] as Point,
    })),
  });
  for (let i = 0; i + 1 < pitchXs.length; i += 1) {
    shapes.push(dimensionShape('pitch', pitchXs[i]!, pitchXs[i + 1]!, at.pitchAt, frame));
  }
  return shapes;
}
