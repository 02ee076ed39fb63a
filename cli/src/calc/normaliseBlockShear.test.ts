import { describe, expect, it } from 'vitest';
import { angle } from '../engine/sections/angle.js';
import type { HoleInput } from '../engine/types.js';
import { calcReaders } from './calcReaders.js';
import { normaliseBlockShear } from './normaliseBlockShear.js';

const legHole: HoleInput = { id: 'A', x: 0, y: 1.5, element: 'leg-a', gauge: 2.5, type: 'standard' };

describe('normaliseBlockShear', () => {
  it('reads the end distance and keeps Ubs, Ut and the tension factors by outline', () => {
    const read = calcReaders('in');
    expect(
      normaliseBlockShear(
        { endDistance: '1-1/2', Ubs: 0.5, byOutline: { 'to-edge': 0.6 } },
        '/members/0',
        undefined,
        [],
        read,
      ),
    ).toEqual({ endDistance: 1.5, Ubs: 0.5, byOutline: { 'to-edge': 0.6 } });
    expect(read.issues).toEqual([]);
  });

  it('elements-without-section on a plate; block-shear-element for an element without holes', () => {
    const read = calcReaders('in');
    normaliseBlockShear({ endDistance: 1.5, elements: ['plate'] }, '/members/0', undefined, [], read);
    const built = angle(4, 4, 0.5);
    normaliseBlockShear(
      { endDistance: 1.5, elements: ['leg-a', 'leg-b'] },
      '/members/1',
      { built },
      [legHole],
      read,
    );
    expect(read.issues.map((i) => [i.pointer, i.rule])).toEqual([
      ['/members/0/blockShear/elements', 'elements-without-section'],
      ['/members/1/blockShear/elements/1', 'block-shear-element'],
    ]);
  });
});
