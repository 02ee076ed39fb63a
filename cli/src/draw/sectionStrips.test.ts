import { describe, expect, it } from 'vitest';
import { sectionStripShapes, type StripFrame } from './sectionStrips.js';

// Paper = member units × 10, y up from the outline's bottom at paper y 100.
const frame = (holeYs: number[] = [], holeXs: number[] = []): StripFrame => ({
  left: 0,
  right: 100,
  Y: (y) => 100 - 10 * y,
  holeYs,
  holeXs,
});

describe('sectionStripShapes', () => {
  it('draws an angle unfolded: one dashed heel line at a − t/2 and each leg labelled with its thickness', () => {
    // L4x4x3/8: leg a's centreline span 3.8125 (sections/README.md), unfolded width 7.625 = a + b − t.
    const shapes = sectionStripShapes({ shape: 'angle', a: 4, b: 4, t: 0.375 }, frame(), 'in');
    const lines = shapes.filter((s) => s.kind === 'line');
    expect(lines).toEqual([
      { kind: 'line', from: [0, 100 - 38.125], to: [100, 100 - 38.125], stroke: 'centre' },
      { kind: 'line', from: [0, 100 - 38.125], to: [100, 100 - 38.125], stroke: 'centre' },
    ]);
    const texts = shapes.flatMap((s) => (s.kind === 'text' ? [s.text] : []));
    expect(texts).toEqual(['leg-a · t = 3/8 in', 'leg-b · t = 3/8 in']);
  });

  it('draws a W-shape as flange, web, flange with the web junction inside each flange, labels clear of gauge lines', () => {
    const holeYs = [3.25, 8.75];
    const shapes = sectionStripShapes(
      { shape: 'w-shape', d: 12.3, bf: 12, tf: 0.67, tw: 0.43 },
      frame(holeYs, [20, 80]),
      'in',
    );
    const dashed = shapes.filter((s) => s.kind === 'line' && s.stroke === 'centre');
    // Two junctions, each a line in the flange (at bf/2) and one at the web strip's edge.
    expect(dashed).toHaveLength(4);
    const labels = shapes.filter((s) => s.kind === 'text');
    expect(labels.map((s) => (s.kind === 'text' ? s.text : ''))).toEqual([
      'flange-1 · t = 0.670 in',
      'web · t = 0.430 in',
      'flange-2 · t = 0.670 in',
    ]);
    // In the widest gap between pitch lines, and not on a gauge line of flange-1.
    const f1 = labels[0]!;
    if (f1.kind !== 'text') throw new Error('text expected');
    expect(f1.at[0]).toBe(50);
    const yMember = (100 - (f1.at[1] - 0.9)) / 10;
    for (const y of [...holeYs, 6]) expect(Math.abs(yMember - y)).toBeGreaterThan(0.5);
  });
});
