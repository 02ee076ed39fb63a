import type { LoadDirection, MemberInput, MemberResult } from '../engine/types.js';
import { netWidthLabel } from './labels.js';
import { DIR_TEXT, TEXT, type SheetFrame } from './sheet.js';
import { sheetText } from './sheetText.js';
import type { FractureShape, Point } from './types.js';

/**
 * The governing fracture line of each direction: from the edge y = 0 straight to the first hole,
 * hole to hole, and straight on to the far edge (cli/docs/method.md §3), with a leader up to its label
 * (`−x: A–B–C–D · wn = 11.542 in`). A chain governing both ways is drawn once and labelled for both;
 * labels stack above the plate.
 *
 * @param member - the member (its holes)
 * @param result - its analysis (each direction's governing chain)
 * @param frame - the sheet frame
 * @returns one fracture per distinct governing chain, in direction order
 * @example
 * fractureShapes(d9, result, frame)[0]?.holes // → ['A', 'B', 'C', 'D']
 */
export function fractureShapes(
  member: MemberInput,
  result: MemberResult,
  frame: SheetFrame,
): FractureShape[] {
  const { X, Y, W, top, units } = frame;
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
  const at = new Map(member.holes.map((h) => [h.id, h]));
  const shapes: FractureShape[] = [];
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
    shapes.push({
      kind: 'fracture',
      directions,
      holes: chain.holes,
      netWidth: chain.netWidth,
      points: pts,
      stroke,
      leader: { from: exit, to: [labelAt[0], labelAt[1] + 1] },
      label: sheetText(
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
    });
    labelRow += 1;
  }
  return shapes;
}
