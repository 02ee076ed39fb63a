import { memberSection } from '../engine/member/memberSection.js';
import { unfoldedStrips } from '../engine/sections/unfoldedStrips.js';
import type { MemberSectionInput, UnitSystem } from '../engine/types.js';
import { lengthLabel } from './labels.js';
import type { Shape } from './types.js';

/** Where the unfolded member sits on the sheet: its left and right ends and y → paper. */
export interface StripFrame {
  readonly left: number;
  readonly right: number;
  /** Paper y of an unfolded y (member units, 0 at the first strip's edge). */
  readonly Y: (y: number) => number;
  /** Unfolded y of the holes' gauge lines, which labels keep clear of. */
  readonly holeYs: readonly number[];
  /** Paper x of the holes' pitch lines; labels go in the widest gap between them and the ends. */
  readonly holeXs: readonly number[];
}

/**
 * The unfolded section of a rolled-shape member as drawing shapes of existing kinds (engine
 * sections/README.md §7): each element's strip boundary as a solid line, each junction (an angle's
 * heel, a web-to-flange junction) as a dashed line, and a label per strip with the element and its
 * thickness. The member's holes are already at their unfolded y (the calc loader puts them there).
 *
 * @param section - the member's section input
 * @param frame - the sheet placement of the member outline
 * @param units - for the thickness labels
 * @returns lines and texts to draw over the outline
 * @example
 * // L4x4x3/8: strips [0, 3.8125] and [3.8125, 7.625], one dashed heel line between them
 * sectionStripShapes({ shape: 'angle', a: 4, b: 4, t: 0.375 }, frame, 'in').filter((s) => s.kind === 'text').length // → 2
 */
export function sectionStripShapes(
  section: MemberSectionInput,
  frame: StripFrame,
  units: UnitSystem,
): Shape[] {
  const { strips, junctions } = unfoldedStrips(memberSection(section));
  const lo = Math.min(...strips.map((s) => s.y0));
  const hi = Math.max(...strips.map((s) => s.y1));
  const eps = 1e-9 * Math.max(1, hi - lo);
  const shapes: Shape[] = [];
  const junctionYs = new Set(junctions.flatMap((j) => j.lines.map((l) => Math.round((l.y - lo) / eps))));
  // Strip edges inside the outline that are not junctions (a web strip starting after a whole flange).
  for (const s of strips) {
    for (const y of [s.y0 - lo, s.y1 - lo]) {
      if (y <= eps || y >= hi - lo - eps || junctionYs.has(Math.round(y / eps))) continue;
      shapes.push({
        kind: 'line',
        from: [frame.left, frame.Y(y)],
        to: [frame.right, frame.Y(y)],
        stroke: 'outline',
      });
    }
  }
  for (const j of junctions) {
    for (const l of j.lines) {
      const y = frame.Y(l.y - lo);
      shapes.push({ kind: 'line', from: [frame.left, y], to: [frame.right, y], stroke: 'centre' });
    }
  }
  const xs = [frame.left, ...[...frame.holeXs].sort((a, b) => a - b), frame.right];
  let labelX = (frame.left + frame.right) / 2;
  let gap = -1;
  for (let i = 1; i < xs.length; i++) {
    if (xs[i]! - xs[i - 1]! > gap) {
      gap = xs[i]! - xs[i - 1]!;
      labelX = (xs[i]! + xs[i - 1]!) / 2;
    }
  }
  // Each label at the point of its strip (middle first, then outward in 5 % steps to 10 % from the
  // edges) farthest from the outline, junction and gauge lines.
  const busy = [0, hi - lo, ...junctions.flatMap((j) => j.lines.map((l) => l.y - lo)), ...frame.holeYs];
  for (const s of strips) {
    const candidates = Array.from(
      { length: 17 },
      (_, i) => s.y0 - lo + (0.5 + (i % 2 ? 1 : -1) * Math.ceil(i / 2) * 0.05) * (s.y1 - s.y0),
    );
    const clear = (y: number) => Math.min(Infinity, ...busy.map((b) => Math.abs(b - y)));
    const best = candidates.reduce((a, b) => (clear(b) > clear(a) + eps ? b : a));
    const mid = frame.Y(best);
    shapes.push({
      kind: 'text',
      at: [labelX, mid + 0.9],
      text: `${s.element} · t = ${lengthLabel(s.thickness, units)} ${units}`,
      size: 2.3,
      anchor: 'middle',
      italic: true,
      role: 'label',
    });
  }
  return shapes;
}
