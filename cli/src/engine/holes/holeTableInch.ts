import type { CodeStandard } from '../types.js';

/** One row of a nominal hole dimension table: `[width, length]` for slots. */
export interface HoleTableRow {
  /** Nominal bolt diameter. */
  readonly bolt: number;
  readonly standard: number;
  readonly oversized: number;
  readonly shortSlot: readonly [number, number];
  readonly longSlot: readonly [number, number];
}

// AISC 360 Table J3.3, Nominal Hole Dimensions, in. Source of each value:
// - 1/2 to 7/8 in rows: memory of the standard (all three editions agree).
// - 3/4 in short slot 13/16 × 1: published (AISC engineering FAQ 5.1.1).
// - 1 in standard 1-1/8 and ≥ 1-1/8 in standard d + 1/8 from the 2016 edition: published (AISC teaching
//   calculations to AISC 360-16, W12x72 with 1-1/8 in bolts, hole 1-1/4 in; WT8x25 with 1 in bolts,
//   hole 1-1/8 in).
// - 2010 edition 1-1/16 and d + 1/16: memory. Oversized and slot lengths for 1 in and up: memory.
const SMALL_ROWS: readonly HoleTableRow[] = [
  { bolt: 0.5, standard: 9 / 16, oversized: 5 / 8, shortSlot: [9 / 16, 11 / 16], longSlot: [9 / 16, 1.25] },
  {
    bolt: 0.625,
    standard: 11 / 16,
    oversized: 13 / 16,
    shortSlot: [11 / 16, 7 / 8],
    longSlot: [11 / 16, 1 + 9 / 16],
  },
  {
    bolt: 0.75,
    standard: 13 / 16,
    oversized: 15 / 16,
    shortSlot: [13 / 16, 1],
    longSlot: [13 / 16, 1 + 7 / 8],
  },
  {
    bolt: 0.875,
    standard: 15 / 16,
    oversized: 1 + 1 / 16,
    shortSlot: [15 / 16, 1 + 1 / 8],
    longSlot: [15 / 16, 2 + 3 / 16],
  },
];

/** Clearance of the standard hole over the bolt for 1 in bolts and up, by edition. */
function largeClearance(standard: CodeStandard): number {
  return standard === 'AISC 360-10' ? 1 / 16 : 1 / 8;
}

const SAME_SIZE = 1e-6;

/**
 * Row of AISC 360 Table J3.3 (inch) for a bolt diameter, for the given edition, or `undefined` when the
 * table has no row for that size (a size below 1-1/8 in that is not 1/2, 5/8, 3/4, 7/8 or 1 in).
 *
 * @param boltDiameter - nominal bolt diameter, in
 * @param standard - edition: from 2016 the 1 in bolt's standard hole is 1-1/8 in, 2010 had 1-1/16 in
 * @returns the table row, in
 * @example
 * holeTableInch(0.75, 'AISC 360-22')?.standard // → 0.8125 (13/16 in)
 * holeTableInch(1, 'AISC 360-10')?.standard    // → 1.0625 (1-1/16 in)
 * holeTableInch(1.25, 'AISC 360-16')?.longSlot // → [1.375, 3.125] ((d + 1/8) × 2.5d)
 */
export function holeTableInch(boltDiameter: number, standard: CodeStandard): HoleTableRow | undefined {
  const small = SMALL_ROWS.find((row) => Math.abs(row.bolt - boltDiameter) < SAME_SIZE);
  if (small) return small;
  const c = largeClearance(standard);
  if (Math.abs(boltDiameter - 1) < SAME_SIZE) {
    return {
      bolt: 1,
      standard: 1 + c,
      oversized: 1.25,
      shortSlot: [1 + c, 1 + 5 / 16],
      longSlot: [1 + c, 2.5],
    };
  }
  if (boltDiameter >= 1.125 - SAME_SIZE) {
    const d = boltDiameter;
    return {
      bolt: d,
      standard: d + c,
      oversized: d + 5 / 16,
      shortSlot: [d + c, d + 3 / 8],
      longSlot: [d + c, 2.5 * d],
    };
  }
  return undefined;
}
