import type { MemberInput, MemberResult } from '../engine/types.js';
import { distinctSorted } from './distinctSorted.js';
import type { SheetFrame } from './sheet.js';
import type { Point, Shape } from './types.js';

/**
 * The holes at their nominal size (slots as slots, longer along sheet x when they run along the load)
 * and the centre lines that carry them: each gauge line from just before its first hole out past the
 * plate's right edge to the gauge dimension string at paper x `gaugeAt`, each row of holes from above
 * its highest hole down to the pitch string at paper y `pitchAt`. The centre lines are drawn first and
 * serve as the dimensions' extension lines.
 *
 * @param member - the member
 * @param result - its analysis (nominal hole sizes)
 * @param frame - the sheet frame
 * @param gaugeAt - paper x of the gauge string
 * @param pitchAt - paper y of the pitch string
 * @returns the centre lines (gauge lines, then rows), then the holes in file order
 * @example
 * // D.9: four 13/16 in holes at 1:5, radius 13/32 · 25.4/5 mm
 * holeShapes(d9, result, frame, 260, 140).filter((s) => s.kind === 'circle').length // → 4
 */
export function holeShapes(
  member: MemberInput,
  result: MemberResult,
  frame: SheetFrame,
  gaugeAt: number,
  pitchAt: number,
): Shape[] {
  const { X, Y, eps, k } = frame;
  const holes = member.holes;
  const widths = new Map(result.holeWidths.map((h) => [h.holeId, h]));
  const shapes: Shape[] = [];
  for (const y of distinctSorted(
    holes.map((h) => h.y),
    eps,
  )) {
    const onLine = holes.filter((h) => Math.abs(h.y - y) <= eps);
    const first = Math.min(...onLine.map((h) => h.x));
    shapes.push({ kind: 'line', from: [X(first) - 4, Y(y)], to: [gaugeAt + 2, Y(y)], stroke: 'centre' });
  }
  for (const x of distinctSorted(
    holes.map((h) => h.x),
    eps,
  )) {
    const onLine = holes.filter((h) => Math.abs(h.x - x) <= eps);
    const highest = Math.max(...onLine.map((h) => h.y));
    shapes.push({ kind: 'line', from: [X(x), Y(highest) - 4], to: [X(x), pitchAt + 2], stroke: 'centre' });
  }
  for (const h of holes) {
    const w = widths.get(h.id);
    const across = (w?.nominalAcross ?? 0) * k;
    const along = (w?.nominalAlong ?? 0) * k;
    const centre: Point = [X(h.x), Y(h.y)];
    if (Math.abs(across - along) < 1e-9) {
      shapes.push({ kind: 'circle', holeId: h.id, centre, radius: across / 2, stroke: 'hole' });
    } else {
      shapes.push({ kind: 'slot', holeId: h.id, centre, along, across, stroke: 'hole' });
    }
  }
  return shapes;
}
