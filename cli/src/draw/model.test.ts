import { describe, expect, it } from 'vitest';
import { analyseMember } from '../engine/index.js';
import type { CodeProfile, MemberInput } from '../engine/types.js';
import { buildDrawing } from './model.js';
import { slotPath, toSvg } from './svg.js';
import type { CircleShape, DimensionShape, FractureShape, SlotShape } from './types.js';
import { parseSvg } from '../../test/xml.js';

// Hole layout of AISC Design Examples v13.0, Example D.9 (R1): 14 × 1/2 in plate, 3/4 in bolts,
// gauges 2, 3, 4, 3, 2 in, inner lines 2-1/2 in further along.
const d9: MemberInput = {
  id: 'D9',
  kind: 'plate',
  width: 14,
  thickness: 0.5,
  material: { grade: 'A36', Fy: 36, Fu: 58 },
  holes: [
    { id: 'A', x: 0, y: 2, boltDiameter: 0.75, type: 'standard' },
    { id: 'B', x: 2.5, y: 5, boltDiameter: 0.75, type: 'standard' },
    { id: 'C', x: 2.5, y: 9, boltDiameter: 0.75, type: 'standard' },
    { id: 'D', x: 0, y: 12, boltDiameter: 0.75, type: 'standard' },
    { id: 'E', x: 5, y: 12, boltDiameter: 0.75, type: 'short-slotted', slot: 'along' },
  ],
  directions: ['-x'],
};
const profile: CodeProfile = { standard: 'AISC 360-22', method: 'LRFD', units: 'in' };

describe('buildDrawing', () => {
  const result = analyseMember(d9, profile);
  const drawing = buildDrawing(d9, result, { units: 'in', profile, project: 'Harbour Lantern Footbridge' });

  it('picks a standard scale and draws holes to it at their nominal size', () => {
    expect(drawing.scale).toBe(5);
    expect(drawing.paperPerUnit).toBeCloseTo(25.4 / 5, 12);
    const circles = drawing.shapes.filter((s): s is CircleShape => s.kind === 'circle');
    expect(circles.map((c) => c.holeId)).toEqual(['A', 'B', 'C', 'D']);
    // 3/4 in bolt, standard hole 13/16 in (AISC 360-22 Table J3.3).
    for (const c of circles) expect(c.radius).toBeCloseTo((13 / 16 / 2) * drawing.paperPerUnit, 9);
  });

  it('draws a slot along the load longer in sheet x than in sheet y', () => {
    const slot = drawing.shapes.find((s): s is SlotShape => s.kind === 'slot')!;
    expect(slot.holeId).toBe('E');
    expect(slot.along).toBeGreaterThan(slot.across);
    expect(slotPath(slot.centre, slot.along, slot.across)).toMatch(/^M[\d.]+,[\d.]+ H[\d.]+ A/);
  });

  it('keeps real distances to scale: B and C are 4 in apart across, A and B 2 1/2 in along', () => {
    const at = new Map(
      drawing.shapes.filter((s): s is CircleShape => s.kind === 'circle').map((c) => [c.holeId, c.centre]),
    );
    expect((at.get('B')![1] - at.get('C')![1]) / drawing.paperPerUnit).toBeCloseTo(4, 9);
    expect((at.get('B')![0] - at.get('A')![0]) / drawing.paperPerUnit).toBeCloseTo(2.5, 9);
  });

  it('dimensions the gauges edge to edge and the pitches between hole rows', () => {
    const dims = drawing.shapes.filter((s): s is DimensionShape => s.kind === 'dimension');
    expect(dims.filter((d) => d.measure === 'gauge').map((d) => d.label.text)).toEqual([
      '2',
      '3',
      '4',
      '3',
      '2',
    ]);
    expect(dims.filter((d) => d.measure === 'pitch').map((d) => d.label.text)).toEqual(['2 1/2', '2 1/2']);
    expect(dims.find((d) => d.measure === 'width')!.value).toBe(14);
    for (const d of dims) expect(d.ticks).toHaveLength(2);
  });

  it('draws the governing chain as a fracture line from edge to edge through its hole centres', () => {
    const fracture = drawing.shapes.find((s): s is FractureShape => s.kind === 'fracture')!;
    const governing = result.directions[0]!.governing!;
    expect(fracture.holes).toEqual(governing.holes);
    expect(fracture.points).toHaveLength(governing.holes.length + 2);
    expect(fracture.label.text).toContain(`wn = ${governing.netWidth.toFixed(3)} in`);
    const ys = fracture.points.map((p) => p[1]);
    expect(Math.max(...ys) - Math.min(...ys)).toBeCloseTo(14 * drawing.paperPerUnit, 9);
  });

  it('puts load arrows at the loaded end only and a title block with member, plate and material', () => {
    const arrows = drawing.shapes.filter((s) => s.kind === 'arrow' && s.purpose === 'load');
    expect(arrows.length).toBeGreaterThan(0);
    for (const a of arrows) if (a.kind === 'arrow') expect(a.head[0]).toBeLessThan(a.tail[0]);
    const texts = drawing.shapes.flatMap((s) => (s.kind === 'text' ? [s.text] : []));
    expect(texts).toContain('D9 — plate');
    expect(texts.some((t) => t.startsWith('PL 1/2 × 14 in · A36 (Fy 36.0 ksi, Fu 58.0 ksi)'))).toBe(true);
    expect(texts).toContain('SCALE 1:5');
  });

  it('serialises to an SVG sized in millimetres with a title for screen readers', () => {
    const svg = toSvg(drawing);
    parseSvg(svg);
    expect(svg).toContain(`width="${drawing.width}mm"`);
    expect(svg).toContain('<title>D9: 5 holes, 1/2 × 14 in plate, scale 1:5</title>');
  });
});
