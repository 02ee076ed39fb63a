import { describe, expect, it } from 'vitest';
import { dimensionStrings } from './dimensionStrings.js';
import { d9, d9Frame as frame } from './drawing.fixtures.js';

describe('dimensionStrings', () => {
  const dims = dimensionStrings(d9, frame, { gaugeAt: 250, widthAt: 262, pitchAt: 140 });

  it('D.9: gauges 2, 3, 4, 3, 2 in edge to edge, the width 14 in with the edges’ extension lines, the pitch 2 1/2 in', () => {
    expect(dims.map((d) => [d.measure, d.label.text])).toEqual([
      ['gauge', '2'],
      ['gauge', '3'],
      ['gauge', '4'],
      ['gauge', '3'],
      ['gauge', '2'],
      ['width', '14'],
      ['pitch', '2 1/2'],
    ]);
    const width = dims.find((d) => d.measure === 'width')!;
    expect(width.extensions.map((e) => e.from)).toEqual([
      [frame.right + 1.5, frame.Y(0)],
      [frame.right + 1.5, frame.Y(14)],
    ]);
  });
});
