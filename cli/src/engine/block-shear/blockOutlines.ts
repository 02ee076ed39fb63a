import { BlockShearError } from './blockShearError.js';
import type { BlockHole, BlockOutline, BlockOutlineKind, BlockShearLayout } from './types.js';

/**
 * Proposes the block shear outlines of a bolt group (AISC 360 J4.3; the same outlines serve
 * EN 1993-1-8 3.10.2 and CSA S16 13.11): shear planes along the outer bolt lines from the loaded end
 * to the last hole of each line, and a tension plane across the last hole of each gauge line.
 * - two-plane (U-shaped): both outer lines in shear, tension between them (two or more gauge lines);
 * - one-plane to a free edge (L-shaped): the line farthest from that edge in shear, tension from it to
 *   the edge.
 * Holes on a shear plane are deducted in full except the last, which is shared with the tension plane
 * and deducted half on each; on the tension plane the end holes count half and the others in full.
 * A staggered tension plane adds s²/4g between consecutive holes (AISC 360 B4.3b applied to the
 * tension plane; marked `project-defined`).
 *
 * @param layout - connected element, holes, direction, loaded end and free edges
 * @returns one outline per kind that can form
 * @throws BlockShearError when a hole does not lie beyond the loaded end or inside the width
 * @example
 * // 2L6x6x5/8, 9 bolts at 3 in, 2.125 from the end, 2.25 from the heel (R6): one plane to the toe
 * blockOutlines(twoAngles)[0] // → { kind: 'one-plane-to-high-edge', Agv: 32.656, Anv: 22.031, Agt: 4.688, Ant: 4.063, … }
 */
export function blockOutlines(layout: BlockShearLayout): BlockOutline[] {
  const t = layout.thickness;
  const pieces = layout.pieces ?? 1;
  if (!(t > 0) || !(layout.width > 0)) throw new BlockShearError('width and thickness must be positive');
  if (!(Number.isInteger(pieces) && pieces >= 1))
    throw new BlockShearError(`pieces must be a whole number ≥ 1, got ${pieces}`);
  const sign = layout.direction === '-x' ? 1 : -1;
  const eps = 1e-9 * Math.max(1, layout.width, ...layout.holes.map((h) => Math.abs(h.x)));
  for (const h of layout.holes) {
    if (!(sign * (h.x - layout.endX) > eps)) {
      throw new BlockShearError(`hole "${h.id}" does not lie beyond the loaded end x = ${layout.endX}`);
    }
    if (!(h.y > 0 && h.y < layout.width)) throw new BlockShearError(`hole "${h.id}" lies outside the width`);
  }
  // Gauge lines in y order, each with its holes nearest the end first.
  const lines: BlockHole[][] = [];
  for (const h of [...layout.holes].sort((a, b) => a.y - b.y)) {
    const line = lines.find((l) => Math.abs(l[0]!.y - h.y) <= eps);
    if (line) line.push(h);
    else lines.push([h]);
  }
  for (const l of lines) l.sort((a, b) => sign * (a.x - b.x));
  if (lines.length === 0) return [];
  const last = (l: BlockHole[]): BlockHole => l[l.length - 1]!;
  const shear = (l: BlockHole[]) => {
    const length = Math.abs(last(l).x - layout.endX);
    let holes = 0;
    for (const h of l) holes += h.deducted;
    return { gross: length, net: length - holes + last(l).deducted / 2 };
  };
  const tension = (from: number, to: number, halfAtFrom: boolean, halfAtTo: boolean) => {
    let deducted = 0;
    let stagger = 0;
    for (let i = from; i <= to; i++) {
      const d = last(lines[i]!).deducted;
      deducted += (i === from && halfAtFrom) || (i === to && halfAtTo) ? d / 2 : d;
      if (i > from) {
        const a = last(lines[i - 1]!);
        const b = last(lines[i]!);
        stagger += (a.x - b.x) ** 2 / (4 * (b.y - a.y));
      }
    }
    return { deducted, stagger, holes: lines.slice(from, to + 1).map((l) => last(l).id) };
  };
  const outline = (
    kind: BlockOutlineKind,
    shearLines: BlockHole[][],
    gross: number,
    plane: ReturnType<typeof tension>,
  ): BlockOutline => {
    let Lgv = 0;
    let Lnv = 0;
    for (const l of shearLines) {
      const s = shear(l);
      Lgv += s.gross;
      Lnv += s.net;
    }
    const k = t * pieces;
    return {
      kind,
      shearPlanes: shearLines.map((l) => l[0]!.y),
      tensionHoles: plane.holes,
      staggerSum: plane.stagger,
      Agv: Lgv * k,
      Anv: Lnv * k,
      Agt: gross * k,
      Ant: (gross - plane.deducted + plane.stagger) * k,
      source: plane.stagger > 0 ? 'project-defined' : 'code',
    };
  };
  const m = lines.length;
  const first = lines[0]!;
  const lastLine = lines[m - 1]!;
  const out: BlockOutline[] = [];
  if (m >= 2) {
    out.push(
      outline('two-plane', [first, lastLine], lastLine[0]!.y - first[0]!.y, tension(0, m - 1, true, true)),
    );
  }
  if (layout.freeEdges.low) {
    out.push(outline('one-plane-to-low-edge', [lastLine], lastLine[0]!.y, tension(0, m - 1, false, true)));
  }
  if (layout.freeEdges.high) {
    out.push(
      outline('one-plane-to-high-edge', [first], layout.width - first[0]!.y, tension(0, m - 1, true, false)),
    );
  }
  return out;
}
