import { describe, expect, it } from 'vitest';
import { calcReaders } from './calcReaders.js';
import { normaliseSection } from './normaliseSection.js';

describe('normaliseSection', () => {
  it('reads the dimensions and the tabulated Ag, and builds the section', () => {
    const read = calcReaders('in');
    const { spec, built } = normaliseSection(
      { shape: 'angle', a: 4, b: 4, t: '3/8', Ag: 2.86 },
      'angle',
      '/members/0',
      read,
    );
    expect(spec).toEqual({ shape: 'angle', a: 4, b: 4, t: 0.375, tabulatedAg: 2.86 });
    expect(built!.elements.map((e) => e.id)).toEqual(['leg-a', 'leg-b']);
    expect(read.issues).toEqual([]);
  });

  it('section-kind: two angles back to back are a double-angle', () => {
    const read = calcReaders('in');
    normaliseSection({ shape: 'angle', a: 6, b: 6, t: 0.625, pieces: 2 }, 'angle', '/members/1', read);
    expect(read.issues.map((i) => [i.pointer, i.rule])).toEqual([['/members/1/kind', 'section-kind']]);
    expect(read.issues[0]!.message).toContain('is kind "double-angle", not "angle"');
  });

  it('section-dimensions when the dimensions make no section, and no section built', () => {
    const read = calcReaders('in');
    const { built } = normaliseSection(
      { shape: 'w-shape', d: 14, bf: 10, tf: 8, tw: 0.415 },
      'w-shape',
      '/members/0',
      read,
    );
    expect(built).toBeUndefined();
    expect(read.issues.map((i) => [i.pointer, i.rule])).toEqual([
      ['/members/0/section', 'section-dimensions'],
    ]);
  });
});
