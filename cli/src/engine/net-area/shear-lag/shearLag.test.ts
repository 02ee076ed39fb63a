import { describe, expect, it } from 'vitest';
import { shearLagCase2 } from './shearLagCase2.js';
import { shearLagCase7 } from './shearLagCase7.js';
import { shearLagCase8 } from './shearLagCase8.js';
import { ShearLagError } from './shearLagError.js';
import { shearLagFactor } from './shearLagFactor.js';
import { shearLagFloor } from './shearLagFloor.js';

// R6: AISC teaching calculations to AISC 360-16 / 15th ed. Manual. Section properties (ȳ, x̄, bf, d)
// are inputs taken from the examples as published.
describe('shearLagFactor against published AISC 360-16 teaching calcs (R6)', () => {
  it('W12x72 bolted through both flanges, l = 12, ȳ of the WT6x36 = 1.02: U = 0.915 (case 2 over case 7’s 0.90)', () => {
    // bf 12.0, d 12.3 (AISC Manual 15th ed.); five bolts per line at 3 in (l = 12 in).
    const r = shearLagFactor({
      shape: 'W',
      connected: 'flange',
      length: 12,
      eccentricity: 1.02,
      fastenersPerLine: 5,
      bf: 12.0,
      d: 12.3,
    });
    expect(r.U).toBeCloseTo(0.915, 3);
    expect(r.case).toBe(2);
    expect(r.candidates.map((c) => c.case)).toEqual([2, 7]);
  });

  it('2L6x6x5/8, 9 bolts at 3 in (l = 24), x̄ = 1.72: U = 0.928 (case 2 over case 8’s 0.80)', () => {
    const r = shearLagFactor({
      shape: 'double-angle',
      connected: 'leg',
      length: 24,
      eccentricity: 1.72,
      fastenersPerLine: 9,
    });
    expect(r.U).toBeCloseTo(0.928, 3);
    expect(r.candidates.find((c) => c.case === 8)?.U).toBe(0.8);
  });

  it('WT8x25 flange bolted, l = 6: U = 0.90 by case 7 over case 2’s 0.685', () => {
    // ȳ 1.89, bf 7.07, d 8.13 (AISC Manual 15th ed., as the example uses); 3 bolts per line (l = 6 at 3 in).
    const r = shearLagFactor({
      shape: 'tee',
      connected: 'flange',
      length: 6,
      eccentricity: 1.89,
      fastenersPerLine: 3,
      bf: 7.07,
      d: 8.13,
    });
    expect(r.U).toBe(0.9);
    expect(r.case).toBe(7);
    expect(r.candidates.find((c) => c.case === 2)?.U).toBeCloseTo(0.685, 3);
  });
});

describe('Table D3.1 cases (AISC 360-16 Table D3.1, as restated in R6’s calcs)', () => {
  it('case 2 is 1 − x̄/l and refuses a connection length that is not positive', () => {
    expect(shearLagCase2(1, 4)).toBe(0.75);
    expect(() => shearLagCase2(1, 0)).toThrow(ShearLagError);
    expect(() => shearLagCase2(5, 4)).toThrow(/less than the connection length/);
  });

  it('case 7: 0.90 for bf ≥ 2/3 d, 0.85 below, with 3 or more per line; web 0.70 with 4 or more', () => {
    expect(shearLagCase7({ connected: 'flange', fastenersPerLine: 3, bf: 8, d: 12 })).toBe(0.9);
    expect(shearLagCase7({ connected: 'flange', fastenersPerLine: 3, bf: 7.9, d: 12 })).toBe(0.85);
    expect(shearLagCase7({ connected: 'flange', fastenersPerLine: 2, bf: 8, d: 12 })).toBeNull();
    expect(shearLagCase7({ connected: 'web', fastenersPerLine: 4 })).toBe(0.7);
    expect(shearLagCase7({ connected: 'web', fastenersPerLine: 3 })).toBeNull();
  });

  it('case 8: 0.80 with 4 or more per line, 0.60 with 3, none with fewer', () => {
    expect([shearLagCase8(4), shearLagCase8(3), shearLagCase8(2)]).toEqual([0.8, 0.6, null]);
  });

  it('uses a given U as is and says when no case applies', () => {
    expect(shearLagFactor({ shape: 'other', connected: 'other', given: 0.87 })).toMatchObject({
      U: 0.87,
      case: 'given',
    });
    expect(() => shearLagFactor({ shape: 'single-angle', connected: 'leg', fastenersPerLine: 2 })).toThrow(
      /give x̄ and l, or U/,
    );
  });
});

describe('the D3 floor of open sections (AISC 360-16 D3, published text: U need not be less than the ratio of the gross area of the connected element(s) to the member gross area)', () => {
  it('is the connected share of Ag, at most 1, and refuses areas that are not positive', () => {
    // W14x68 (d 14.0, bf 10.0, tf 0.720, Ag 20.0 in²; Quimby, as R4/R5 use it): both flanges 2·10.0·0.72 = 14.4.
    expect(shearLagFloor(14.4, 20.0)).toBeCloseTo(0.72, 12);
    expect(shearLagFloor(25, 20)).toBe(1);
    expect(() => shearLagFloor(0, 20)).toThrow(ShearLagError);
    expect(() => shearLagFloor(5, -1)).toThrow(/gross area must be positive/);
  });

  it('raises a smaller Table D3.1 U to the floor and reports it; a larger U is kept', () => {
    // Both flanges of the W14x68, 2 bolts per line (case 7 needs 3), l = 3 in, ȳ of the WT7x34 = 1.29 in
    // (from memory of the AISC Manual): case 2 U = 1 − 1.29/3 = 0.57 < floor 0.72.
    const low = shearLagFactor({
      shape: 'W',
      connected: 'flange',
      length: 3,
      eccentricity: 1.29,
      fastenersPerLine: 2,
      bf: 10,
      d: 14,
      floor: { connectedArea: 14.4, grossArea: 20 },
    });
    expect(low.U).toBeCloseTo(0.72, 12);
    expect(low.case).toBe('D3 floor');
    expect(low.floor?.basis).toBe("connected elements' gross area / Ag = 14.4/20 = 0.72");
    // R6 W12x72 (case 2, 0.915) is above its floor 2·12.0·0.670/21.1 = 0.762 (AISC Manual 15th ed. dimensions).
    const high = shearLagFactor({
      shape: 'W',
      connected: 'flange',
      length: 12,
      eccentricity: 1.02,
      fastenersPerLine: 5,
      bf: 12.0,
      d: 12.3,
      floor: { connectedArea: 2 * 12.0 * 0.67, grossArea: 21.1 },
    });
    expect(high.U).toBeCloseTo(0.915, 3);
    expect(high.case).toBe(2);
    expect(high.floor?.U).toBeCloseTo(0.762, 3);
  });
});
