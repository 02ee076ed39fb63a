import { describe, expect, it } from 'vitest';
import { calcReaders } from './calcReaders.js';
import { normaliseHole } from './normaliseHole.js';

describe('normaliseHole', () => {
  it('reads lengths and the bolt, standard by default', () => {
    expect(
      normaliseHole({ id: 'A', x: 0, y: '2-1/2', bolt: '3/4' }, '/members/0/holes/0', calcReaders('in')),
    ).toEqual({
      id: 'A',
      x: 0,
      y: 2.5,
      type: 'standard',
      boltDiameter: 0.75,
    });
  });

  it('a slot across the load deducts its length across (width along), along the load its width', () => {
    const read = calcReaders('in');
    const across = normaliseHole(
      { id: 'S', x: 0, y: 3, type: 'short-slotted', slot: 'across', size: { width: '13/16', length: 1 } },
      '/h',
      read,
    );
    expect(across.dimension).toEqual({ across: 1, along: 0.8125 });
    const along = normaliseHole(
      { id: 'S', x: 0, y: 3, type: 'short-slotted', slot: 'along', size: { width: '13/16', length: 1 } },
      '/h',
      read,
    );
    expect(along.dimension).toEqual({ across: 0.8125, along: 1 });
    expect(read.issues).toEqual([]);
  });

  it('rules slot-on-round-hole and slot-size, at their pointers', () => {
    const read = calcReaders('in');
    normaliseHole({ id: 'R', x: 0, y: 3, slot: 'along' }, '/members/0/holes/2', read);
    normaliseHole(
      { id: 'S', x: 0, y: 3, type: 'long-slotted', slot: 'along', size: { width: 1, length: 0.5 } },
      '/members/0/holes/3',
      read,
    );
    expect(read.issues.map((i) => [i.pointer, i.rule])).toEqual([
      ['/members/0/holes/2/slot', 'slot-on-round-hole'],
      ['/members/0/holes/3/size/length', 'slot-size'],
    ]);
  });

  it('a section hole keeps its element and gauge and waits for its unfolded y', () => {
    const h = normaliseHole(
      { id: 'A', x: 0, element: 'leg-a', gauge: '2-1/2', bolt: '3/4' },
      '/h',
      calcReaders('in'),
    );
    expect(h.y).toBeNaN();
    expect([h.element, h.gauge]).toEqual(['leg-a', 2.5]);
  });
});
