import { describe, expect, it } from 'vitest';
import { holeTableInch } from './holeTableInch.js';

describe('holeTableInch (AISC 360 Table J3.3, in)', () => {
  it('gives the 1/2 to 7/8 in rows of every edition (memory of AISC 360 Table J3.3)', () => {
    for (const standard of ['AISC 360-10', 'AISC 360-16', 'AISC 360-22'] as const) {
      expect(holeTableInch(0.5, standard)).toMatchObject({
        standard: 9 / 16,
        oversized: 5 / 8,
        shortSlot: [9 / 16, 11 / 16],
        longSlot: [9 / 16, 1.25],
      });
      expect(holeTableInch(0.625, standard)).toMatchObject({
        standard: 11 / 16,
        oversized: 13 / 16,
        shortSlot: [11 / 16, 7 / 8],
        longSlot: [11 / 16, 1 + 9 / 16],
      });
      expect(holeTableInch(0.875, standard)).toMatchObject({
        standard: 15 / 16,
        oversized: 1 + 1 / 16,
        shortSlot: [15 / 16, 1 + 1 / 8],
        longSlot: [15 / 16, 2 + 3 / 16],
      });
    }
  });

  it('gives the 3/4 in short slot as 13/16 × 1 (published: AISC engineering FAQ 5.1.1)', () => {
    expect(holeTableInch(0.75, 'AISC 360-22')?.shortSlot).toEqual([13 / 16, 1]);
    expect(holeTableInch(0.75, 'AISC 360-22')?.standard).toBe(13 / 16);
  });

  it('gives the 1 in standard hole as 1-1/8 from the 2016 edition (published: AISC 360-16 teaching calc, WT8x25)', () => {
    expect(holeTableInch(1, 'AISC 360-16')?.standard).toBe(1.125);
    expect(holeTableInch(1, 'AISC 360-22')).toMatchObject({
      standard: 1.125,
      oversized: 1.25,
      shortSlot: [1.125, 1 + 5 / 16],
      longSlot: [1.125, 2.5],
    });
  });

  it('gives d + 1/8 for 1-1/8 in bolts and up from 2016 (published: AISC 360-16 teaching calc, W12x72, hole 1-1/4 in)', () => {
    expect(holeTableInch(1.125, 'AISC 360-16')?.standard).toBe(1.25);
    expect(holeTableInch(1.5, 'AISC 360-22')).toMatchObject({
      standard: 1.625,
      oversized: 1.5 + 5 / 16,
      shortSlot: [1.625, 1.875],
      longSlot: [1.625, 3.75],
    });
  });

  it('keeps the 2010 edition: 1-1/16 for a 1 in bolt and d + 1/16 above (memory of AISC 360-10)', () => {
    expect(holeTableInch(1, 'AISC 360-10')?.standard).toBe(1 + 1 / 16);
    expect(holeTableInch(1.25, 'AISC 360-10')).toMatchObject({
      standard: 1.3125,
      shortSlot: [1.3125, 1.625],
      longSlot: [1.3125, 3.125],
    });
  });

  it('has no row for a size below 1-1/8 in that is not in the table', () => {
    expect(holeTableInch(0.8, 'AISC 360-22')).toBeUndefined();
    expect(holeTableInch(0.375, 'AISC 360-22')).toBeUndefined();
    expect(holeTableInch(1.0625, 'AISC 360-16')).toBeUndefined();
  });
});
