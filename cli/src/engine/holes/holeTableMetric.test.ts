import { describe, expect, it } from 'vitest';
import { holeTableMetric } from './holeTableMetric.js';

// Expected rows: AISC Table J3.3M as reproduced in Brockenbrough & Merritt, Structural Steel
// Designer's Handbook, 4th ed., Table 5.11 (published).
const PUBLISHED: readonly [number, number, number, [number, number], [number, number]][] = [
  [16, 18, 20, [18, 22], [18, 40]],
  [20, 22, 24, [22, 26], [22, 50]],
  [22, 24, 28, [24, 30], [24, 55]],
  [24, 27, 30, [27, 32], [27, 60]],
  [27, 30, 35, [30, 37], [30, 67]],
  [30, 33, 38, [33, 40], [33, 75]],
];

describe('holeTableMetric (AISC 360 Table J3.3M, mm)', () => {
  it.each(PUBLISHED)('gives the published row for M%i', (bolt, standard, oversized, shortSlot, longSlot) => {
    expect(holeTableMetric(bolt)).toEqual({ bolt, standard, oversized, shortSlot, longSlot });
  });

  it('gives d+3, d+8, (d+3)×(d+10), (d+3)×2.5d from M36 up (published, Brockenbrough Table 5.11)', () => {
    expect(holeTableMetric(36)).toEqual({
      bolt: 36,
      standard: 39,
      oversized: 44,
      shortSlot: [39, 46],
      longSlot: [39, 90],
    });
  });

  it('has no row for M12, M33 or M18', () => {
    expect(holeTableMetric(12)).toBeUndefined();
    expect(holeTableMetric(33)).toBeUndefined();
    expect(holeTableMetric(18)).toBeUndefined();
  });
});
