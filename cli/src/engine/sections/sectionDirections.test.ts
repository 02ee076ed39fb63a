import { describe, expect, it } from 'vitest';
import { quimbyEx3Holes, w14x68 } from './sections.fixtures.js';
import { sectionDirections } from './sectionDirections.js';
import { SectionError } from './sectionError.js';
import { unfold } from './unfold.js';

describe('sectionDirections', () => {
  const layout = unfold(w14x68, quimbyEx3Holes, { tabulatedAg: 20.0 });

  it('Quimby Example 3 (conformance/SOURCES.md R5): four flange and two web holes, An 16.86 in² published', () => {
    const [minus] = sectionDirections(layout, ['-x'], 10);
    expect(minus!.direction).toBe('-x');
    expect(Math.abs(minus!.An - 16.86)).toBeLessThanOrEqual(0.005);
    expect(minus!.governing!.netArea).toBe(minus!.An);
    expect(minus!.leastChains.length).toBeLessThanOrEqual(10);
  });

  it('keeps k chains per direction, in the order the directions are asked for', () => {
    const both = sectionDirections(layout, ['+x', '-x'], 2);
    expect(both.map((d) => d.direction)).toEqual(['+x', '-x']);
    for (const d of both) expect(d.leastChains.length).toBeLessThanOrEqual(2);
  });

  it('refuses no direction and a repeated one', () => {
    expect(() => sectionDirections(layout, [], 1)).toThrow(SectionError);
    expect(() => sectionDirections(layout, ['-x', '-x'], 1)).toThrow(/without repeats/);
  });
});
