import type { HoleTableRow } from './holeTableInch.js';

// AISC 360 Table J3.3M, Nominal Hole Dimensions, mm: published, as reproduced in Brockenbrough &
// Merritt, Structural Steel Designer's Handbook, 4th ed., Table 5.11. The same in the 2010, 2016 and
// 2022 editions as far as our sources show.
const ROWS: readonly HoleTableRow[] = [
  { bolt: 16, standard: 18, oversized: 20, shortSlot: [18, 22], longSlot: [18, 40] },
  { bolt: 20, standard: 22, oversized: 24, shortSlot: [22, 26], longSlot: [22, 50] },
  { bolt: 22, standard: 24, oversized: 28, shortSlot: [24, 30], longSlot: [24, 55] },
  { bolt: 24, standard: 27, oversized: 30, shortSlot: [27, 32], longSlot: [27, 60] },
  { bolt: 27, standard: 30, oversized: 35, shortSlot: [30, 37], longSlot: [30, 67] },
  { bolt: 30, standard: 33, oversized: 38, shortSlot: [33, 40], longSlot: [33, 75] },
];

const SAME_SIZE = 1e-6;

/**
 * Row of AISC 360 Table J3.3M (mm) for a bolt diameter, or `undefined` when the table has no row for
 * that size (anything below M36 other than M16, M20, M22, M24, M27, M30).
 *
 * @param boltDiameter - nominal bolt diameter, mm (20 for M20)
 * @returns the table row, mm
 * @example
 * holeTableMetric(20)?.shortSlot // → [22, 26]
 * holeTableMetric(36)?.longSlot  // → [39, 90] ((d + 3) × 2.5d)
 */
export function holeTableMetric(boltDiameter: number): HoleTableRow | undefined {
  const row = ROWS.find((r) => Math.abs(r.bolt - boltDiameter) < SAME_SIZE);
  if (row) return row;
  if (boltDiameter >= 36 - SAME_SIZE) {
    const d = boltDiameter;
    return {
      bolt: d,
      standard: d + 3,
      oversized: d + 8,
      shortSlot: [d + 3, d + 10],
      longSlot: [d + 3, 2.5 * d],
    };
  }
  return undefined;
}
