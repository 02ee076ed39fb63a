import { STROKES, type Point, type Shape, type StrokeName, type TextShape, type Drawing } from './types.js';

const FONT =
  "'Liberation Sans Narrow', 'Arial Narrow', 'DejaVu Sans Condensed', 'Helvetica Neue', Arial, sans-serif";

function n(v: number): string {
  return String(Math.round(v * 100) / 100);
}

function esc(s: string): string {
  return s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}

/** Stroke attributes and the one `fill` of the element (an attribute may appear only once in XML). */
function strokeAttrs(name: StrokeName, fill = 'none'): string {
  const s = STROKES[name];
  const dash = s.dash ? ` stroke-dasharray="${s.dash.map(n).join(' ')}"` : '';
  return `stroke="${s.colour}" stroke-width="${n(s.width)}"${dash} fill="${fill}" stroke-linecap="round" stroke-linejoin="round"`;
}

function pts(points: readonly Point[]): string {
  return points.map(([x, y]) => `${n(x)},${n(y)}`).join(' ');
}

/**
 * The outline of a slot (a stadium) as an SVG path: two straight sides and two semicircular ends,
 * running along sheet x when `along` ≥ `across`, else along sheet y.
 */
export function slotPath(centre: Point, along: number, across: number): string {
  const [cx, cy] = centre;
  if (along >= across) {
    const r = across / 2;
    const half = along / 2 - r;
    return `M${n(cx - half)},${n(cy - r)} H${n(cx + half)} A${n(r)},${n(r)} 0 0 1 ${n(cx + half)},${n(cy + r)} H${n(cx - half)} A${n(r)},${n(r)} 0 0 1 ${n(cx - half)},${n(cy - r)} Z`;
  }
  const r = along / 2;
  const half = across / 2 - r;
  return `M${n(cx + r)},${n(cy - half)} V${n(cy + half)} A${n(r)},${n(r)} 0 0 1 ${n(cx - r)},${n(cy + half)} V${n(cy - half)} A${n(r)},${n(r)} 0 0 1 ${n(cx + r)},${n(cy - half)} Z`;
}

/** The filled head of an arrow as a triangle's three points. */
export function arrowHead(tail: Point, head: Point, length: number, width: number): Point[] {
  const dx = head[0] - tail[0];
  const dy = head[1] - tail[1];
  const len = Math.hypot(dx, dy) || 1;
  const ux = dx / len;
  const uy = dy / len;
  const bx = head[0] - ux * length;
  const by = head[1] - uy * length;
  return [
    head,
    [bx - uy * (width / 2), by + ux * (width / 2)],
    [bx + uy * (width / 2), by - ux * (width / 2)],
  ];
}

function textEl(t: TextShape): string {
  const anchor = t.anchor === 'start' ? 'start' : t.anchor === 'end' ? 'end' : 'middle';
  const rotate = t.rotate ? ` transform="rotate(${n(t.rotate)} ${n(t.at[0])} ${n(t.at[1])})"` : '';
  const weight = t.weight === 'bold' ? ' font-weight="bold"' : '';
  const italic = t.italic ? ' font-style="italic"' : '';
  const colour = t.colour ?? '#1a1a1a';
  return `<text x="${n(t.at[0])}" y="${n(t.at[1])}" font-size="${n(t.size)}" text-anchor="${anchor}" fill="${colour}"${weight}${italic}${rotate} data-role="${t.role}">${esc(t.text)}</text>`;
}

function line(from: Point, to: Point, stroke: StrokeName, extra = ''): string {
  return `<line x1="${n(from[0])}" y1="${n(from[1])}" x2="${n(to[0])}" y2="${n(to[1])}" ${strokeAttrs(stroke)}${extra}/>`;
}

function shapeEl(s: Shape): string {
  switch (s.kind) {
    case 'rect':
      return `<rect x="${n(s.at[0])}" y="${n(s.at[1])}" width="${n(s.width)}" height="${n(s.height)}" ${strokeAttrs(s.stroke)}/>`;
    case 'line':
      return line(s.from, s.to, s.stroke);
    case 'polyline':
      return `<${s.closed ? 'polygon' : 'polyline'} points="${pts(s.points)}" ${strokeAttrs(s.stroke)}/>`;
    case 'circle':
      return `<circle cx="${n(s.centre[0])}" cy="${n(s.centre[1])}" r="${n(s.radius)}" ${strokeAttrs(s.stroke, '#ffffff')} data-hole="${esc(s.holeId)}"/>`;
    case 'slot':
      return `<path d="${slotPath(s.centre, s.along, s.across)}" ${strokeAttrs(s.stroke, '#ffffff')} data-hole="${esc(s.holeId)}"/>`;
    case 'dimension':
      return [
        `<g data-dimension="${s.measure}" data-value="${n(s.value)}">`,
        ...s.extensions.map((e) => line(e.from, e.to, 'extension')),
        line(s.line.from, s.line.to, 'dimension'),
        ...s.ticks.map((t) => line(t.from, t.to, 'tick')),
        textEl(s.label),
        '</g>',
      ].join('');
    case 'arrow': {
      const head = arrowHead(s.tail, s.head, s.headLength, s.headWidth);
      const st = STROKES[s.stroke];
      const data =
        s.purpose === 'load'
          ? `data-load="${s.direction ?? ''}"`
          : `data-axis="${s.purpose === 'axis-x' ? 'x' : 'y'}"`;
      return `<g ${data}>${line(s.tail, s.head, s.stroke)}<polygon points="${pts(head)}" fill="${st.colour}" stroke="none"/></g>`;
    }
    case 'fracture':
      return [
        `<g data-fracture="${s.directions.join(' ')}" data-chain="${esc(s.holes.join(' '))}" data-net-width="${s.netWidth}">`,
        `<polyline points="${pts(s.points)}" ${strokeAttrs(s.stroke)}/>`,
        line(s.leader.from, s.leader.to, 'leader'),
        textEl(s.label),
        '</g>',
      ].join('');
    case 'claimed-chain':
      return [
        `<g data-claimed-chain="${esc(s.holes.join(' '))}"${s.direction ? ` data-direction="${s.direction}"` : ''}${s.netWidth !== undefined ? ` data-net-width="${s.netWidth}"` : ''}>`,
        s.points.length > 1 ? `<polyline points="${pts(s.points)}" ${strokeAttrs(s.stroke)}/>` : '',
        ...s.markers.map((m) => `<polygon points="${pts(m)}" ${strokeAttrs(s.stroke)}/>`),
        s.leader ? line(s.leader.from, s.leader.to, 'leader') : '',
        textEl(s.label),
        '</g>',
      ].join('');
    case 'text':
      return textEl(s);
  }
}

/**
 * Serialises a drawing as a standalone SVG document sized in millimetres, so it prints to scale.
 *
 * @example
 * toSvg(buildDrawing(member, result, { units: 'in' })).startsWith('<svg') // → true
 */
export function toSvg(drawing: Drawing): string {
  const w = n(drawing.width);
  const h = n(drawing.height);
  // Fractures go last but under the labels of holes, so hole ids stay readable.
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" xml:space="preserve" width="${w}mm" height="${h}mm" viewBox="0 0 ${w} ${h}" font-family="${esc(FONT)}" role="img" aria-label="${esc(drawing.title)}">`,
    `<title>${esc(drawing.title)}</title>`,
    `<rect x="0" y="0" width="${w}" height="${h}" fill="#fdfdf8"/>`,
    ...drawing.shapes.map(shapeEl),
    '</svg>',
    '',
  ].join('\n');
}
