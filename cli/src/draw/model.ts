import type { CodeProfile, LoadDirection, MemberInput, MemberResult, UnitSystem } from '../engine/types.js';
import { codeLabel } from '../engine/codeLabel.js';
import { formatQuantity } from '../engine/formatQuantity.js';
import { lengthLabel, netWidthLabel } from './labels.js';
import { sectionStripShapes } from './sectionStrips.js';
import type { DimensionShape, Drawing, FractureShape, Point, Shape, TextShape } from './types.js';

export interface DrawOptions {
  readonly units: UnitSystem;
  readonly profile?: CodeProfile;
  readonly project?: string;
  /** Line printed along the foot of the sheet. */
  readonly caution?: string;
}

/** Standard drawing scales tried in order: the first that fits the plate on the sheet wins. */
const SCALES = [1, 2, 2.5, 5, 10, 20, 25, 50, 100, 200];
/** The largest plate image, paper mm. */
const MAX_PLATE = { along: 210, across: 120 };
const MARGIN = { left: 34, right: 52, top: 26, bottom: 22 };
const TITLE = { width: 136, height: 31 };
const TEXT = { dim: 2.5, id: 2.3, label: 2.6, title: 3.6, detail: 2.5, caution: 2.2 };

const MM_PER: Record<UnitSystem, number> = { in: 25.4, mm: 1 };

function distinctSorted(values: readonly number[], eps: number): number[] {
  const sorted = [...values].sort((a, b) => a - b);
  const out: number[] = [];
  for (const v of sorted) if (out.length === 0 || v - out[out.length - 1]! > eps) out.push(v);
  return out;
}

function text(
  at: Point,
  value: string,
  size: number,
  role: TextShape['role'],
  extra: Partial<TextShape> = {},
): TextShape {
  return { kind: 'text', at, text: value, size, anchor: 'middle', role, ...extra };
}

/** An oblique 45° tick centred on a point, as on hand-drawn dimension lines. */
function tick(p: Point, size = 1.4): { from: Point; to: Point } {
  return { from: [p[0] - size, p[1] + size], to: [p[0] + size, p[1] - size] };
}

const DIR_TEXT: Record<LoadDirection, string> = { '-x': '−x', '+x': '+x' };

/**
 * The sketch of a member and its result: plate outline, holes at their nominal size (slots as
 * slots), centre lines, gauge and pitch dimension strings, load arrows at the loaded end(s), the
 * governing fracture line of each direction labelled with its net width, hole ids and a title block.
 *
 * The plate's length is not part of a calc file, so the outline runs a generous end distance past
 * the outermost holes.
 *
 * @param member - the member as the engine sees it
 * @param result - the engine's result for it (hole widths, governing chains)
 * @param options - units, code profile and project for the title block
 * @returns the drawing model (paper mm)
 * @example
 * buildDrawing(member, analyseMember(member, profile), { units: 'in', profile }).scale // → 5 for a 14 in plate
 */
export function buildDrawing(member: MemberInput, result: MemberResult, options: DrawOptions): Drawing {
  const units = options.units;
  const W = member.width;
  const holes = member.holes;
  const widths = new Map(result.holeWidths.map((h) => [h.holeId, h]));
  const eps = 1e-6 * Math.max(1, W);

  // Real extents along the load: outermost holes plus an end distance of the larger of 2 hole
  // diameters and a fifth of the width, so the outline reads as a plate and not a strip.
  const largest = Math.max(0, ...result.holeWidths.map((h) => Math.max(h.nominalAlong, h.nominalAcross)));
  const endDistance = Math.max(2 * largest, 0.2 * W);
  const xs = holes.map((h) => h.x);
  const x0 = (xs.length > 0 ? Math.min(...xs) : 0) - endDistance;
  const x1 = (xs.length > 0 ? Math.max(...xs) : W) + endDistance;
  const lengthReal = x1 - x0;

  const mm = MM_PER[units];
  const scale =
    SCALES.find((n) => (lengthReal * mm) / n <= MAX_PLATE.along && (W * mm) / n <= MAX_PLATE.across) ?? 500;
  const k = mm / scale;
  const plateW = lengthReal * k;
  const plateH = W * k;

  const sheetW = Math.max(MARGIN.left + plateW + MARGIN.right, TITLE.width + 28);
  const left = MARGIN.left + Math.max(0, (sheetW - MARGIN.left - MARGIN.right - plateW) / 2);
  const top = MARGIN.top;
  const sheetH = top + plateH + MARGIN.bottom + TITLE.height + 18;
  const X = (x: number): number => left + (x - x0) * k;
  const Y = (y: number): number => top + (W - y) * k;
  const right = left + plateW;
  const bottom = top + plateH;

  const shapes: Shape[] = [];
  shapes.push({ kind: 'rect', at: [5, 5], width: sheetW - 10, height: sheetH - 10, stroke: 'frame' });

  // Plate outline: the long edges solid, the ends as break lines, since a calc file gives no plate
  // length and the plate runs on into the connection at a loaded end.
  shapes.push({ kind: 'line', from: [left, top], to: [right, top], stroke: 'outline' });
  shapes.push({ kind: 'line', from: [left, bottom], to: [right, bottom], stroke: 'outline' });
  for (const edge of [left, right])
    shapes.push({ kind: 'polyline', points: breakLine(edge, top, bottom), closed: false, stroke: 'outline' });
  // A rolled shape is drawn unfolded: element strips, dashed junction lines, each element's thickness.
  if (member.section) {
    const holeYs = holes.map((h) => h.y);
    const holeXs = holes.map((h) => X(h.x));
    shapes.push(...sectionStripShapes(member.section, { left, right, Y, holeYs, holeXs }, units));
  }
  const gaugeYs = distinctSorted(
    holes.map((h) => h.y),
    eps,
  );
  const pitchXs = distinctSorted(
    holes.map((h) => h.x),
    eps,
  );

  // Centre lines: each gauge line runs from just before its first hole out past the plate's right
  // edge to the gauge dimension string; each pitch line from above the plate down to the pitch string.
  const gaugeAt = right + 24;
  const widthAt = right + 36;
  const pitchAt = bottom + 12;
  for (const y of gaugeYs) {
    const onLine = holes.filter((h) => Math.abs(h.y - y) <= eps);
    const first = Math.min(...onLine.map((h) => h.x));
    shapes.push({ kind: 'line', from: [X(first) - 4, Y(y)], to: [gaugeAt + 2, Y(y)], stroke: 'centre' });
  }
  for (const x of pitchXs) {
    const onLine = holes.filter((h) => Math.abs(h.x - x) <= eps);
    const highest = Math.max(...onLine.map((h) => h.y));
    shapes.push({ kind: 'line', from: [X(x), Y(highest) - 4], to: [X(x), pitchAt + 2], stroke: 'centre' });
  }
  // Holes at their nominal size.
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

  // Gauge string: 0 → each gauge line → W; overall width outside it.
  const stops = distinctSorted([0, ...gaugeYs, W], eps);
  for (let i = 0; i + 1 < stops.length; i += 1) {
    shapes.push(verticalDimension(stops[i]!, stops[i + 1]!, gaugeAt, Y, units, 'gauge'));
  }
  // The overall width carries the extension lines of the plate edges (the gauge string shares them);
  // hole centre lines run out to the strings and serve as their own extension lines.
  shapes.push({
    ...verticalDimension(0, W, widthAt, Y, units, 'width'),
    extensions: [0, W].map((y) => ({ from: [right + 1.5, Y(y)] as Point, to: [widthAt + 2, Y(y)] as Point })),
  });
  // Pitch string between hole rows.
  for (let i = 0; i + 1 < pitchXs.length; i += 1) {
    shapes.push(horizontalDimension(pitchXs[i]!, pitchXs[i + 1]!, pitchAt, X, units));
  }

  // Load arrows at the loaded end(s), placed in the widest gaps between gauge lines so no arrow
  // sits on a centre line.
  const gaps = stops
    .slice(0, -1)
    .map((a, i) => ({ mid: (a + stops[i + 1]!) / 2, size: stops[i + 1]! - a }))
    .sort((p, q) => q.size - p.size)
    .slice(0, 3)
    .map((g) => g.mid)
    .sort((a, b) => a - b);
  const arrowYs = gaps.length > 0 ? gaps : [W / 2];
  const loaded = new Set(result.directions.map((d) => d.direction));
  for (const direction of loaded) {
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
      text([edge + sign * 9.5, labelY], `T (${DIR_TEXT[direction]})`, TEXT.label, 'load', {
        anchor: 'middle',
      }),
    );
  }

  // Governing fracture lines; a chain governing both ways is drawn once and labelled for both.
  const byChain = new Map<
    string,
    { directions: LoadDirection[]; chain: NonNullable<MemberResult['directions'][number]['governing']> }
  >();
  for (const d of result.directions) {
    if (!d.governing) continue;
    const key = d.governing.holes.join('\u0000');
    const entry = byChain.get(key);
    if (entry) entry.directions.push(d.direction);
    else byChain.set(key, { directions: [d.direction], chain: d.governing });
  }
  const at = new Map(holes.map((h) => [h.id, h]));
  let labelRow = 0;
  for (const { directions, chain } of byChain.values()) {
    const pts: Point[] = [];
    const chainHoles = chain.holes
      .map((id) => at.get(id))
      .filter((h): h is NonNullable<typeof h> => h !== undefined);
    if (chainHoles.length === 0) continue;
    const firstHole = chainHoles[0]!;
    const lastHole = chainHoles[chainHoles.length - 1]!;
    pts.push([X(firstHole.x), Y(0)]);
    for (const h of chainHoles) pts.push([X(h.x), Y(h.y)]);
    pts.push([X(lastHole.x), Y(W)]);
    const stroke = directions.includes('-x') ? 'fracture-minus' : 'fracture-plus';
    const exit: Point = [X(lastHole.x), top];
    const labelAt: Point = [exit[0], top - 7 - labelRow * 5.5];
    const dirs = directions.map((d) => DIR_TEXT[d]).join(', ');
    const shape: FractureShape = {
      kind: 'fracture',
      directions,
      holes: chain.holes,
      netWidth: chain.netWidth,
      points: pts,
      stroke,
      leader: { from: exit, to: [labelAt[0], labelAt[1] + 1] },
      label: text(
        labelAt,
        `${dirs}: ${chain.holes.join('–')} · wn = ${netWidthLabel(chain.netWidth, units)}`,
        TEXT.label,
        'fracture',
        {
          anchor: 'middle',
          weight: 'bold',
          colour: stroke === 'fracture-minus' ? '#c0392b' : '#1f5aa6',
        },
      ),
    };
    shapes.push(shape);
    labelRow += 1;
  }

  // Axes: x along the load, y across it from the edge at y = 0.
  const ax: Point = [left - 22, bottom + 10];
  shapes.push({
    kind: 'arrow',
    purpose: 'axis-x',
    tail: ax,
    head: [ax[0] + 10, ax[1]],
    headLength: 1.8,
    headWidth: 1.2,
    stroke: 'dimension',
  });
  shapes.push({
    kind: 'arrow',
    purpose: 'axis-y',
    tail: ax,
    head: [ax[0], ax[1] - 10],
    headLength: 1.8,
    headWidth: 1.2,
    stroke: 'dimension',
  });
  shapes.push(text([ax[0] + 11.5, ax[1] + 0.9], 'x', TEXT.dim, 'label', { anchor: 'start', italic: true }));
  shapes.push(text([ax[0], ax[1] - 11.5], 'y', TEXT.dim, 'label', { anchor: 'middle', italic: true }));

  // Hole ids at the corner of each hole farthest from the fracture lines, so no line crosses them.
  const fractureSegments = shapes.flatMap((sh) =>
    sh.kind === 'fracture' ? sh.points.slice(1).map((p, i) => [sh.points[i]!, p] as const) : [],
  );
  for (const h of holes) {
    const w = widths.get(h.id);
    const rx = ((w?.nominalAlong ?? 0) * k) / 2;
    const ry = ((w?.nominalAcross ?? 0) * k) / 2;
    const cx = X(h.x);
    const cy = Y(h.y);
    const corners = [
      { at: [cx + rx * 0.75 + 0.8, cy - ry * 0.75 - 0.8] as Point, anchor: 'start' as const },
      { at: [cx - rx * 0.75 - 0.8, cy - ry * 0.75 - 0.8] as Point, anchor: 'end' as const },
      { at: [cx + rx * 0.75 + 0.8, cy + ry * 0.75 + 2.6] as Point, anchor: 'start' as const },
      { at: [cx - rx * 0.75 - 0.8, cy + ry * 0.75 + 2.6] as Point, anchor: 'end' as const },
    ];
    const clearance = (c: (typeof corners)[number]): number => {
      // Judge the middle of the label, not its anchor.
      const mid: Point = [c.at[0] + (c.anchor === 'start' ? 1 : -1) * h.id.length * 0.6, c.at[1] - 0.8];
      return Math.min(Infinity, ...fractureSegments.map(([a, b]) => distanceToSegment(mid, a, b)));
    };
    const best = corners.reduce((a, b) => (clearance(b) > clearance(a) + 0.5 ? b : a));
    shapes.push(text(best.at, h.id, TEXT.id, 'hole-id', { anchor: best.anchor }));
  }

  shapes.push(...titleBlock(member, result, options, sheetW, sheetH, scale));
  return {
    width: round(sheetW),
    height: round(sheetH),
    scale,
    paperPerUnit: k,
    units,
    memberId: member.id,
    title: `${member.id}: ${member.holes.length} holes, ${lengthLabel(member.thickness, units)} × ${lengthLabel(W, units)} ${units} plate, scale 1:${scale}`,
    shapes,
  };
}

function distanceToSegment(p: Point, a: Point, b: Point): number {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const len2 = dx * dx + dy * dy;
  const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / len2));
  return Math.hypot(p[0] - (a[0] + t * dx), p[1] - (a[1] + t * dy));
}

/** A straight end edge with the usual Z-shaped break in its middle. */
function breakLine(x: number, top: number, bottom: number): Point[] {
  const mid = (top + bottom) / 2;
  const h = Math.min(4, (bottom - top) / 6);
  return [
    [x, top],
    [x, mid - h],
    [x - 2.2, mid - h * 0.35],
    [x + 2.2, mid + h * 0.35],
    [x, mid + h],
    [x, bottom],
  ];
}

function round(v: number): number {
  return Math.round(v * 100) / 100;
}

function verticalDimension(
  a: number,
  b: number,
  lineX: number,
  Y: (y: number) => number,
  units: UnitSystem,
  measure: 'gauge' | 'width',
): DimensionShape {
  const p: Point = [lineX, Y(a)];
  const q: Point = [lineX, Y(b)];
  const mid = (p[1] + q[1]) / 2;
  return {
    kind: 'dimension',
    measure,
    value: b - a,
    extensions: [],
    line: {
      from: [lineX, p[1] + (measure === 'width' ? 2 : 0)],
      to: [lineX, q[1] - (measure === 'width' ? 2 : 0)],
    },
    ticks: [tick(p), tick(q)],
    label: text([lineX - 1.3, mid], lengthLabel(b - a, units), TEXT.dim, 'dimension', {
      rotate: -90,
      anchor: 'middle',
    }),
  };
}

function horizontalDimension(
  a: number,
  b: number,
  lineY: number,
  X: (x: number) => number,
  units: UnitSystem,
): DimensionShape {
  const p: Point = [X(a), lineY];
  const q: Point = [X(b), lineY];
  return {
    kind: 'dimension',
    measure: 'pitch',
    value: b - a,
    extensions: [],
    line: { from: [p[0] - 2, lineY], to: [q[0] + 2, lineY] },
    ticks: [tick(p), tick(q)],
    label: text([(p[0] + q[0]) / 2, lineY - 1.3], lengthLabel(b - a, units), TEXT.dim, 'dimension'),
  };
}

const KIND_TEXT: Record<MemberInput['kind'], string> = {
  angle: 'angle (legs unfolded)',
  'double-angle': 'double angle (legs unfolded)',
  tee: 'tee (unfolded)',
  'w-shape': 'W-shape (unfolded)',
  channel: 'channel (unfolded)',
  plate: 'plate',
  'splice-plate': 'splice plate',
  gusset: 'gusset plate',
};

function titleBlock(
  member: MemberInput,
  result: MemberResult,
  options: DrawOptions,
  sheetW: number,
  sheetH: number,
  scale: number,
): Shape[] {
  const u = options.units;
  const x = sheetW - 9 - TITLE.width;
  const y = sheetH - 9 - 9 - TITLE.height;
  const shapes: Shape[] = [
    { kind: 'rect', at: [x, y], width: TITLE.width, height: TITLE.height, stroke: 'frame' },
    { kind: 'line', from: [x, y + 8], to: [x + TITLE.width, y + 8], stroke: 'frame' },
  ];
  const line = (
    row: number,
    value: string,
    role: TextShape['role'] = 'title-detail',
    size = TEXT.detail,
  ): TextShape => text([x + 2.5, y + 13.2 + row * 4.4], value, size, role, { anchor: 'start' });
  shapes.push(
    text([x + 2.5, y + 5.6], `${member.id} — ${KIND_TEXT[member.kind]}`, TEXT.title, 'title', {
      anchor: 'start',
      weight: 'bold',
    }),
  );
  shapes.push(
    text([x + TITLE.width - 2.5, y + 5.6], `SCALE 1:${scale}`, TEXT.detail, 'title-detail', {
      anchor: 'end',
    }),
  );
  const m = member.material;
  shapes.push(
    line(
      0,
      `${['plate', 'splice-plate', 'gusset'].includes(member.kind) ? 'PL' : 'unfolded'} ${lengthLabel(member.thickness, u)} × ${lengthLabel(member.width, u)} ${u} · ${m.grade ?? 'steel'} (Fy ${formatQuantity(m.Fy, 'stress', u)}, Fu ${formatQuantity(m.Fu, 'stress', u)}) · ${member.holes.length} holes`,
    ),
  );
  const std = options.profile?.standard ?? '';
  const sym = std.startsWith('EN')
    ? 'N,Rd'
    : std.startsWith('CSA')
      ? 'Tr'
      : options.profile?.method === 'ASD'
        ? 'Pn/Ω'
        : 'φPn';
  shapes.push(
    line(
      1,
      `Ag ${formatQuantity(result.Ag, 'area', u)} · An ${formatQuantity(result.An, 'area', u)} (${DIR_TEXT[result.governingDirection]}) · U ${formatQuantity(result.U, 'ratio', u)} · Ae ${formatQuantity(result.Ae, 'area', u)}${result.capped ? ' (0.85 Ag)' : ''}`,
    ),
  );
  shapes.push(
    line(
      2,
      `${sym} ${formatQuantity(result.governing.available, 'force', u)} (${result.governing.limitState} governs)${blockShearNote(result, u)}${options.profile ? ` · ${codeLabel(options.profile)}` : ''}`,
    ),
  );
  shapes.push(
    line(
      3,
      `${options.project ? `${options.project} · ` : ''}dimensions in ${u === 'in' ? 'inches' : 'mm'} · holes drawn at nominal size`,
    ),
  );
  if (options.caution) {
    shapes.push(
      text([sheetW / 2, sheetH - 8.5], options.caution, TEXT.caution, 'caution', {
        anchor: 'middle',
        italic: true,
      }),
    );
  }
  return shapes;
}

/** Block shear is a connection limit state reported beside the member's: say so when it is lower. */
function blockShearNote(result: MemberResult, units: UnitSystem): string {
  const bs = result.blockShear;
  if (!bs || bs.available >= result.governing.available) return '';
  return ` · block shear ${formatQuantity(bs.available, 'force', units)} is lower`;
}
