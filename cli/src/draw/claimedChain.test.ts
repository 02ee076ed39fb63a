import { describe, expect, it } from 'vitest';
import { analyseMember } from '../engine/index.js';
import type { CodeProfile, MemberInput } from '../engine/types.js';
import { chainPoints, withClaimedChain } from './claimedChain.js';
import { buildDrawing } from './model.js';
import { toSvg } from './svg.js';
import type { CircleShape, ClaimedChainShape, Drawing } from './types.js';
import { parseSvg } from '../../test/xml.js';

// Hole layout of AISC Design Examples v13.0, Example D.9 (conformance/SOURCES.md R1): 14 × 1/2 in
// plate, 3/4 in bolts, gauges 2, 3, 4, 3, 2 in, inner lines 2-1/2 in further along. The claimed
// chain below (A–D, straight across) is a fictional submitter's, not the example's.
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
  ],
  directions: ['-x'],
};
const profile: CodeProfile = { standard: 'AISC 360-22', method: 'LRFD', units: 'in' };
const drawing = buildDrawing(d9, analyseMember(d9, profile), { units: 'in', profile });

const centre = (d: Drawing, id: string) =>
  d.shapes.find((s): s is CircleShape => s.kind === 'circle' && s.holeId === id)!.centre;
const claimedOf = (d: Drawing) => d.shapes.find((s): s is ClaimedChainShape => s.kind === 'claimed-chain');

describe('chainPoints', () => {
  it('runs from the edge at y = 0 through the hole centres to the far edge', () => {
    const points = chainPoints(drawing, ['A', 'D'])!;
    const a = centre(drawing, 'A');
    const d = centre(drawing, 'D');
    expect(points).toHaveLength(4);
    expect(points[1]).toEqual(a);
    expect(points[2]).toEqual(d);
    expect(points[0]![0]).toBe(a[0]);
    expect(points[3]![0]).toBe(d[0]);
    // 14 in of plate between the two edges at the drawing's scale.
    expect((points[0]![1] - points[3]![1]) / drawing.paperPerUnit).toBeCloseTo(14, 9);
  });

  it('answers null when no hole of the chain is on the drawing', () => {
    expect(chainPoints(drawing, ['Z9'])).toBeNull();
  });
});

describe('withClaimedChain', () => {
  it('adds the claimed chain as a solid line with a diamond round each hole and a label, leaving the drawing as it was', () => {
    const before = drawing.shapes.length;
    const out = withClaimedChain(drawing, { holes: ['A', 'D'], netWidth: 12.25, direction: '-x' });
    expect(drawing.shapes).toHaveLength(before);
    expect(out.shapes).toHaveLength(before + 1);
    const claimed = claimedOf(out)!;
    expect(claimed.points).toEqual(chainPoints(drawing, ['A', 'D']));
    expect(claimed.stroke).toBe('claimed');
    expect(claimed.markers).toHaveLength(2);
    // Each diamond is closed and centred on its hole.
    const [diamond] = claimed.markers;
    expect(diamond![0]).toEqual(diamond![4]);
    expect((diamond![1]![0] + diamond![3]![0]) / 2).toBeCloseTo(centre(drawing, 'A')[0], 9);
    expect(claimed.label.text).toBe('claimed −x: A–D · wn = 12.250 in');
    expect(claimed.label.role).toBe('claimed');
  });

  it('names claimed holes that are not on the plate and draws the rest', () => {
    const claimed = claimedOf(withClaimedChain(drawing, { holes: ['A', 'Q7', 'D'] }))!;
    expect(claimed.points).toHaveLength(4);
    expect(claimed.markers).toHaveLength(2);
    expect(claimed.label.text).toBe('claimed: A–Q7–D (not on the plate: Q7)');
  });

  it('is drawn by toSvg as one well-formed group carrying the chain, beside the governing line', () => {
    const svg = toSvg(withClaimedChain(drawing, { holes: ['A', 'D'], netWidth: 12.25 }));
    const doc = parseSvg(svg);
    const groups = Array.from(doc.getElementsByTagName('g')).filter((g) =>
      g.hasAttribute('data-claimed-chain'),
    );
    expect(groups).toHaveLength(1);
    expect(groups[0]!.getAttribute('data-claimed-chain')).toBe('A D');
    expect(groups[0]!.getAttribute('data-net-width')).toBe('12.25');
    expect(groups[0]!.getElementsByTagName('polygon')).toHaveLength(2);
    // The governing line (A–B–C–D for −x, R1's 11.5 in) is still there.
    const fractures = Array.from(doc.getElementsByTagName('g')).filter((g) =>
      g.hasAttribute('data-fracture'),
    );
    expect(fractures.map((g) => g.getAttribute('data-chain'))).toEqual(['A B C D']);
    // One line per shape: the claimed chain is the only line toSvg(drawing) does not have.
    const plain = new Set(toSvg(drawing).split('\n'));
    expect(svg.split('\n').filter((l) => !plain.has(l))).toEqual([
      expect.stringMatching(/^<g data-claimed-chain="A D"/),
    ]);
  });
});
