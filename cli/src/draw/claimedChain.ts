import { netWidthLabel } from './labels.js';
import type { LoadDirection } from '../engine/types.js';
import type { ClaimedChainShape, Drawing, Point } from './types.js';

/** A chain as a calc file claims it. */
export interface ClaimedChainInput {
  readonly holes: readonly string[];
  readonly netWidth?: number;
  readonly direction?: LoadDirection;
}

/** Where the drawing put the plate's long edges and each hole, read from its own marks. */
function placement(drawing: Drawing): {
  top: number;
  bottom: number;
  centres: Map<string, { centre: Point; radius: number }>;
} | null {
  const centres = new Map<string, { centre: Point; radius: number }>();
  let top = Infinity;
  let bottom = -Infinity;
  for (const s of drawing.shapes) {
    if (s.kind === 'circle') centres.set(s.holeId, { centre: s.centre, radius: s.radius });
    if (s.kind === 'slot')
      centres.set(s.holeId, { centre: s.centre, radius: Math.max(s.along, s.across) / 2 });
    // The end break lines run from the top edge to the bottom edge.
    if (s.kind === 'polyline' && s.stroke === 'outline' && !s.closed) {
      for (const [, y] of s.points) {
        top = Math.min(top, y);
        bottom = Math.max(bottom, y);
      }
    }
  }
  return Number.isFinite(top) ? { top, bottom, centres } : null;
}

/**
 * A chain on the drawing as a fracture line: from the edge at y = 0 (the bottom of the sheet)
 * straight to the first hole's centre, hole to hole, then straight to the far edge
 * (cli/docs/method.md §3, as buildDrawing draws the governing lines). Null when none of the holes is on the drawing.
 *
 * @example
 * chainPoints(drawing, ['A1', 'B1']) // → [[x(A1), bottom], centre(A1), centre(B1), [x(B1), top]]
 */
export function chainPoints(drawing: Drawing, holes: readonly string[]): Point[] | null {
  const at = placement(drawing);
  if (!at) return null;
  const centres = holes.map((id) => at.centres.get(id)?.centre).filter((p): p is Point => p !== undefined);
  const first = centres[0];
  const last = centres[centres.length - 1];
  if (!first || !last) return null;
  return [[first[0], at.bottom], ...centres, [last[0], at.top]];
}

/**
 * The drawing with the claimed controlling chain added beside the governing fracture lines: a solid
 * line (the governing ones are dashed or dotted), a diamond around each claimed hole, and a label
 * below the plate (`claimed −x: A1–B1–C1 · wn = 11.500 in`). Claimed holes that are not on the plate
 * are named in the label and left out of the line.
 *
 * @param drawing - a drawing from buildDrawing
 * @param claimed - the chain the file claims controls
 * @returns a new drawing; the given one is not changed
 * @example
 * withClaimedChain(drawing, { holes: ['A1', 'C1'] }).shapes.at(-1)?.kind // → 'claimed-chain'
 */
export function withClaimedChain(drawing: Drawing, claimed: ClaimedChainInput): Drawing {
  const at = placement(drawing);
  if (!at) return drawing;
  const found = claimed.holes.filter((id) => at.centres.has(id));
  const missing = claimed.holes.filter((id) => !at.centres.has(id));
  const points = chainPoints(drawing, found) ?? [];
  const markers = found.map((id) => {
    const { centre, radius } = at.centres.get(id)!;
    const r = radius + 1.3;
    return [
      [centre[0], centre[1] - r],
      [centre[0] + r, centre[1]],
      [centre[0], centre[1] + r],
      [centre[0] - r, centre[1]],
      [centre[0], centre[1] - r],
    ] as Point[];
  });
  // Below the plate, between the pitch dimensions and the title block, under where the line starts.
  const entry = points[0];
  const labelAt: Point = [entry ? entry[0] : drawing.width / 2, at.bottom + 18.5];
  const direction = claimed.direction === '-x' ? ' −x' : claimed.direction === '+x' ? ' +x' : '';
  const width =
    claimed.netWidth !== undefined ? ` · wn = ${netWidthLabel(claimed.netWidth, drawing.units)}` : '';
  const absent = missing.length > 0 ? ` (not on the plate: ${missing.join(', ')})` : '';
  const shape: ClaimedChainShape = {
    kind: 'claimed-chain',
    holes: claimed.holes,
    ...(claimed.direction ? { direction: claimed.direction } : {}),
    ...(claimed.netWidth !== undefined ? { netWidth: claimed.netWidth } : {}),
    points,
    markers,
    stroke: 'claimed',
    ...(entry ? { leader: { from: entry, to: [labelAt[0], labelAt[1] - 2.8] as Point } } : {}),
    label: {
      kind: 'text',
      at: labelAt,
      text: `claimed${direction}: ${claimed.holes.join('–')}${width}${absent}`,
      size: 2.6,
      anchor: 'middle',
      weight: 'bold',
      colour: '#6a3d9a',
      role: 'claimed',
    },
  };
  return { ...drawing, shapes: [...drawing.shapes, shape] };
}
