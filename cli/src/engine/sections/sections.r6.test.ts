import { describe, expect, it } from 'vitest';
import { shearLagFactor } from '../net-area/shear-lag/shearLagFactor.js';
import { analyseSection } from './analyseSection.js';
import { angle } from './angle.js';
import { twoL6x6, twoL6x6Holes, w12x72, w12x72Holes, wt8x25, wt8x25Holes } from './sections.fixtures.js';
import { unfoldedStrips } from './unfoldedStrips.js';
import { wShape } from './wShape.js';

// R6: AISC teaching calculations to AISC 360-16 / 15th ed. Manual. Section properties (Ag, ȳ, x̄, bf,
// d, tf) are inputs taken from the examples as published; An from the section search, U from
// Table D3.1, Ae = An·U compared with the published rounding.
describe('R6 effective net area: section search × Table D3.1', () => {
  it('W12x72: An 17.6, U 0.915, Ae 16.1 in²', () => {
    const An = analyseSection(w12x72, w12x72Holes, { tabulatedAg: 21.1 }).An;
    const { U } = shearLagFactor({
      shape: 'W',
      connected: 'flange',
      length: 12,
      eccentricity: 1.02,
      fastenersPerLine: 5,
      bf: 12,
      d: 12.3,
    });
    expect(Math.abs(An * U - 16.1)).toBeLessThanOrEqual(0.05);
  });

  it('2L6x6x5/8: An 13.01, U 0.928, Ae 12.07 in²', () => {
    const An = analyseSection(twoL6x6, twoL6x6Holes, { tabulatedAg: 14.26 }).An;
    const { U } = shearLagFactor({
      shape: 'double-angle',
      connected: 'leg',
      length: 24,
      eccentricity: 1.72,
      fastenersPerLine: 9,
    });
    expect(Math.abs(An * U - 12.07)).toBeLessThanOrEqual(0.01);
  });

  it('WT8x25: An 5.87, U 0.90, Ae 5.29 in²', () => {
    const An = analyseSection(wt8x25, wt8x25Holes, { tabulatedAg: 7.37 }).An;
    const { U } = shearLagFactor({
      shape: 'tee',
      connected: 'flange',
      length: 6,
      eccentricity: 1.89,
      fastenersPerLine: 3,
      bf: 7.07,
      d: 8.13,
    });
    expect(Math.abs(An * U - 5.29)).toBeLessThanOrEqual(0.005);
  });
});

describe('unfoldedStrips', () => {
  it('lays an angle out as a + b − t wide with the heel line between the legs', () => {
    const { strips, junctions } = unfoldedStrips(angle(4, 4, 0.5));
    expect(strips.map((s) => [s.y0, s.y1])).toEqual([
      [0, 3.75],
      [3.75, 7.5],
    ]);
    expect(junctions[0]!.lines.map((l) => l.y)).toEqual([3.75, 3.75]);
  });

  it('puts a W-shape web after its first flange with the junction inside the flange strip', () => {
    const { strips, junctions } = unfoldedStrips(wShape(14, 10, 0.72, 0.415));
    expect(strips.map((s) => s.thickness)).toEqual([0.72, 0.415, 0.72]);
    expect(junctions[0]!.lines).toEqual([
      { element: 'flange-1', y: 5 },
      { element: 'web', y: 10 },
    ]);
  });
});
