import { BlockShearError } from './blockShearError.js';
import type {
  BlockHole,
  BlockOutline,
  BlockShearLayout,
  BlockShearPlane,
  BlockTensionSpan,
} from './types.js';

/** More stretches than this (2^n outlines) is refused rather than searched. */
const MAX_SEGMENTS = 20;

interface Line {
  readonly element: string;
  readonly u: number;
  /** Holes of the line, the one nearest the body last. */
  readonly holes: readonly BlockHole[];
  readonly thickness: number;
}

interface Segment {
  readonly element: string;
  readonly from: number;
  readonly to: number;
  readonly width: number;
  readonly thickness: number;
  /** Index of the line at each end, or -1. */
  readonly lineLow: number;
  readonly lineHigh: number;
  /** True at a free element end (no junction there). */
  readonly freeLow: boolean;
  readonly freeHigh: boolean;
}

/**
 * Every block shear outline a checker would draw for a bolt group at a member's end (AISC 360 J4.3;
 * the same outlines serve EN 1993-1-8 3.10.2 and CSA S16 13.11). The cross-section is cut at each
 * bolt line and at each junction of elements into stretches; an outline is a choice of stretches that
 * stay with the bolts (the block). Where the choice changes along the cross-section a shear plane runs
 * from the free end to the tension plane: along a bolt line (through its holes, the last one halved)
 * or, at a junction, through the root of the thinner side (the stem of a tee, the web of a W-shape or
 * a channel's flange). The tension plane crosses the chosen stretches at each bolt line's hole nearest
 * the body: holes inside the block in full, holes on a shear plane half. Every bolt line must bound or
 * lie inside the block, and at least one shear plane must form (the whole section is the net section
 * rupture, not block shear). A staggered tension plane adds s²/4g between consecutive holes of one
 * element (AISC 360 B4.3b applied to the tension plane; `project-defined`).
 *
 * So a plate gets the U-shaped block between its outer lines, the L-shaped ones to either edge and the
 * two edge strips together; a flange-bolted tee also gets the whole flange torn off its stem and the
 * flange torn to one tip with the stem cut; a web-bolted channel the web torn out through a flange.
 *
 * @param layout - elements, junctions, holes, direction and free end
 * @returns every outline that can form, in no particular order
 * @throws BlockShearError on a hole outside its element, at a junction, or not short of the free end
 * @example
 * // 2L6x6x5/8, 9 bolts at 3 in, 2.125 from the end, 2.25 from the heel (R6): least by area to the toe
 * blockOutlines(twoAngles).find((o) => o.kind === 'to-edge') // → { Agv: 32.656, Anv: 22.031, Agt: 4.688, Ant: 4.063, … }
 */
export function blockOutlines(layout: BlockShearLayout): BlockOutline[] {
  const pieces = layout.pieces ?? 1;
  if (!(Number.isInteger(pieces) && pieces >= 1))
    throw new BlockShearError(`pieces must be a whole number ≥ 1, got ${pieces}`);
  const elements = new Map(layout.elements.map((e) => [e.id, e] as const));
  for (const e of layout.elements) {
    if (!(e.thickness > 0) || !(e.span > 0))
      throw new BlockShearError(`element "${e.id}": span and thickness must be positive`);
  }
  const size = Math.max(1, ...layout.elements.map((e) => e.span), ...layout.holes.map((h) => Math.abs(h.x)));
  const eps = layout.tolerance ?? 1e-9 * size;
  // Toward the free end: +1 for -x (free end at +x), −1 for +x.
  const sign = layout.direction === '-x' ? 1 : -1;
  for (const h of layout.holes) {
    const e = elements.get(h.element);
    if (!e) throw new BlockShearError(`hole "${h.id}": no element "${h.element}"`);
    if (!(sign * (layout.endX - h.x) > eps))
      throw new BlockShearError(`hole "${h.id}" does not lie short of the free end x = ${layout.endX}`);
    if (!(h.u > eps && h.u < e.span - eps))
      throw new BlockShearError(`hole "${h.id}" lies outside element "${h.element}"`);
  }
  if (layout.holes.length === 0) return [];

  // Bolt lines: holes of one element at one u, the hole nearest the body last.
  const lines: Line[] = [];
  for (const h of [...layout.holes].sort((a, b) => a.u - b.u)) {
    const line = lines.find((l) => l.element === h.element && Math.abs(l.u - h.u) <= eps);
    if (line) (line.holes as BlockHole[]).push(h);
    else
      lines.push({ element: h.element, u: h.u, holes: [h], thickness: elements.get(h.element)!.thickness });
  }
  for (const l of lines) (l.holes as BlockHole[]).sort((a, b) => sign * (b.x - a.x));
  const last = (l: Line): BlockHole => l.holes[l.holes.length - 1]!;
  // The tension plane lies at the hole nearest the body of all: root planes run to there.
  const rootLength = Math.max(...lines.map((l) => sign * (layout.endX - last(l).x)));

  // Stretches of every element between its bolt lines and junctions.
  const segments: Segment[] = [];
  const junctionSegments = new Map<string, number[]>();
  for (const e of layout.elements) {
    const stations = new Map<number, { line: number; junctions: string[] }>();
    const at = (u: number) => {
      for (const [k, v] of stations) if (Math.abs(k - u) <= eps) return v;
      const v = { line: -1, junctions: [] as string[] };
      stations.set(u, v);
      return v;
    };
    at(0);
    at(e.span);
    lines.forEach((l, i) => {
      if (l.element === e.id) at(l.u).line = i;
    });
    for (const j of layout.junctions) {
      for (const a of j.attachments) if (a.element === e.id) at(a.u).junctions.push(j.id);
    }
    const sorted = [...stations.entries()].sort((a, b) => a[0] - b[0]);
    for (const [u, s] of sorted) {
      if (s.line >= 0 && s.junctions.length > 0)
        throw new BlockShearError(`element "${e.id}": a bolt line lies on the junction at u = ${u}`);
    }
    for (let i = 0; i + 1 < sorted.length; i++) {
      const [a, sa] = sorted[i]!;
      const [b, sb] = sorted[i + 1]!;
      const index = segments.length;
      const lowEnd = i === 0;
      const highEnd = i + 2 === sorted.length;
      segments.push({
        element: e.id,
        from: a,
        to: b,
        width: b - a + (lowEnd ? (e.extendLow ?? 0) : 0) + (highEnd ? (e.extendHigh ?? 0) : 0),
        thickness: e.thickness,
        lineLow: sa.line,
        lineHigh: sb.line,
        freeLow: lowEnd && sa.junctions.length === 0,
        freeHigh: highEnd && sb.junctions.length === 0,
      });
      for (const j of sa.junctions) junctionSegments.set(j, [...(junctionSegments.get(j) ?? []), index]);
      for (const j of sb.junctions) junctionSegments.set(j, [...(junctionSegments.get(j) ?? []), index]);
    }
  }
  if (segments.length > MAX_SEGMENTS)
    throw new BlockShearError(
      `${segments.length} stretches between bolt lines are more than ${MAX_SEGMENTS}`,
    );
  const lineSides = lines.map((_, i) => ({
    low: segments.findIndex((s) => s.lineHigh === i),
    high: segments.findIndex((s) => s.lineLow === i),
  }));

  const out: BlockOutline[] = [];
  const n = segments.length;
  for (let mask = 1; mask < 2 ** n - 1; mask++) {
    const inBlock = (i: number) => ((mask >>> i) & 1) === 1;
    let ok = true;
    const planes: BlockShearPlane[] = [];
    let Lgv = 0;
    let Lnv = 0;
    let deducted = 0;
    const tensionHoles: string[] = [];
    for (let i = 0; i < lines.length && ok; i++) {
      const line = lines[i]!;
      const low = inBlock(lineSides[i]!.low);
      const high = inBlock(lineSides[i]!.high);
      if (!low && !high) ok = false;
      else if (low !== high) {
        const gross = sign * (layout.endX - last(line).x);
        let holes = 0;
        for (const h of line.holes) holes += h.deducted;
        Lgv += gross * line.thickness;
        Lnv += (gross - holes + last(line).deducted / 2) * line.thickness;
        deducted += (last(line).deducted / 2) * line.thickness;
        planes.push({
          element: line.element,
          u: line.u,
          along: 'line',
          holes: line.holes.map((h) => h.id),
          thickness: line.thickness,
        });
        tensionHoles.push(last(line).id);
      } else {
        deducted += last(line).deducted * line.thickness;
        tensionHoles.push(last(line).id);
      }
    }
    if (!ok) continue;
    for (const j of layout.junctions) {
      const incident = junctionSegments.get(j.id) ?? [];
      let tIn = 0;
      let tOut = 0;
      for (const s of incident) {
        if (inBlock(s)) tIn += segments[s]!.thickness;
        else tOut += segments[s]!.thickness;
      }
      if (tIn === 0 || tOut === 0) continue;
      const cutIn = tIn <= tOut;
      const cut = incident.find((s) => inBlock(s) === cutIn)!;
      const seg = segments[cut]!;
      const t = Math.min(tIn, tOut);
      Lgv += rootLength * t;
      Lnv += rootLength * t;
      planes.push({
        element: seg.element,
        u: j.attachments.find((a) => a.element === seg.element)?.u ?? seg.from,
        along: 'root',
        junction: j.id,
        holes: [],
        thickness: t,
      });
    }
    if (planes.length === 0) continue;
    let gross = 0;
    let stagger = 0;
    let staggerSum = 0;
    let freeEdges = 0;
    const tension: BlockTensionSpan[] = [];
    for (let i = 0; i < n; i++) {
      if (!inBlock(i)) continue;
      const s = segments[i]!;
      gross += s.width * s.thickness;
      if (s.freeLow) freeEdges++;
      if (s.freeHigh) freeEdges++;
      const prev = tension[tension.length - 1];
      if (prev && prev.element === s.element && Math.abs(prev.to - s.from) <= eps)
        tension[tension.length - 1] = { ...prev, to: s.to };
      else tension.push({ element: s.element, from: s.from, to: s.to });
    }
    // s²/4g between consecutive bolt lines of one element when the block spans between them.
    for (const e of layout.elements) {
      let previous = -1;
      for (let i = 0; i < n; i++) {
        const s = segments[i]!;
        if (s.element !== e.id) continue;
        if (!inBlock(i)) {
          previous = -1;
          continue;
        }
        if (s.lineLow >= 0) previous = s.lineLow;
        if (s.lineHigh >= 0 && previous >= 0) {
          const a = last(lines[previous]!);
          const b = last(lines[s.lineHigh]!);
          const term = (a.x - b.x) ** 2 / (4 * (b.u - a.u));
          staggerSum += term;
          stagger += term * e.thickness;
          previous = s.lineHigh;
        } else if (s.lineHigh >= 0) previous = s.lineHigh;
      }
    }
    const roots = planes.some((p) => p.along === 'root');
    const base = freeEdges === 0 ? 'two-plane' : freeEdges === 1 ? 'to-edge' : 'to-edges';
    const describePlane = (p: BlockShearPlane) =>
      p.along === 'line'
        ? `along ${p.holes.join('-')}`
        : `through ${p.element} at ${p.junction ?? ''} (t ${round(p.thickness)})`;
    out.push({
      kind: roots ? `${base}+root` : base,
      description: `shear ${planes.map(describePlane).join(', ')}; tension ${tension
        .map((t) => `${t.element} ${round(t.from)}–${round(t.to)}`)
        .join(', ')}`,
      shearPlanes: planes,
      tension,
      tensionHoles,
      freeEdges,
      staggerSum,
      Agv: Lgv * pieces,
      Anv: Lnv * pieces,
      Agt: gross * pieces,
      Ant: (gross - deducted + stagger) * pieces,
      source: stagger > 0 ? 'project-defined' : 'code',
    });
  }
  return out;
}

function round(v: number): string {
  return String(Math.round(v * 1000) / 1000);
}
