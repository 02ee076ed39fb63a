import { describe, expect, it } from 'vitest';
import { angle } from './angle.js';
import { sectionLineDistances } from './sectionLineDistances.js';
import { tee } from './tee.js';
import { unfold } from './unfold.js';

describe('sectionLineDistances', () => {
  it('measures across an angle’s heel as on the flat width a + b − t, and along the straight tails', () => {
    // L4x4x1/2, gauges from the heel: A leg a 2 (x 3), F leg b 2 (x 0), B leg b 2 (x 1), T leg b 3 (x 0.2).
    // Chain A–F: 2 + 2 − 0.5 = 3.5 apart along the centrelines. B on F's gauge line: 1·3.5/√(3² + 3.5²)
    // = 0.7593 from the leg. T lies 1 beyond F toward the toe, where the line runs straight at x 0: 0.2.
    const lay = unfold(angle(4, 4, 0.5), [
      { id: 'A', element: 'leg-a', x: 3, gauge: 2, deducted: 0.875 },
      { id: 'F', element: 'leg-b', x: 0, gauge: 2, deducted: 0.875 },
      { id: 'B', element: 'leg-b', x: 1, gauge: 2, deducted: 0.875 },
      { id: 'T', element: 'leg-b', x: 0.2, gauge: 3, deducted: 0.875 },
    ]);
    const d = sectionLineDistances(lay, [0, 1]);
    expect(d[0]).toBeNaN();
    expect(d[1]).toBeNaN();
    expect(d[2]).toBeCloseTo(3.5 / Math.sqrt(21.25), 12);
    expect(d[3]).toBeCloseTo(0.2, 12);
  });

  it('measures a flange half the chain does not enter through the stem junction, not across the drawing', () => {
    // Tee bf 7.07, tf 0.628, d 8.13, tw 0.38 (WT8x25 dimensions, AISC Manual 15th ed.). FL in the
    // flange at −2 from the stem (u 1.535, x 0), S in the stem 3 from the flange back (u 2.686, x 3),
    // FR in the flange at +3 (u 6.535, x 1.8). Chain FL–S: 2 to the junction + 2.686 down the stem
    // = 4.686; the line crosses the junction at x = 3·2/4.686 = 1.2804 and runs straight across the
    // flange's far half there, so FR is 1.8 − 1.2804 = 0.5196 from it (> 0.4375, a 3/4 in hole's
    // radius). The unfolded drawing lays the whole flange first (y 0–7.07) and the stem after it, so
    // a straight FL–S line on the drawing (y 1.535 → 9.756) would cross FR's y = 6.535 at
    // x = 3·5/8.221 = 1.8246, within 0.03 of FR's centre: that reading would be a false graze.
    const lay = unfold(tee(7.07, 0.628, 8.13, 0.38), [
      { id: 'FL', element: 'flange', x: 0, gauge: -2, deducted: 0.875 },
      { id: 'FR', element: 'flange', x: 1.8, gauge: 3, deducted: 0.875 },
      { id: 'S', element: 'stem', x: 3, gauge: 3, deducted: 0.875 },
    ]);
    const d = sectionLineDistances(lay, [0, 2]);
    expect(d[1]).toBeCloseTo(1.8 - (3 * 2) / 4.686, 9);
    expect(d[1]!).toBeGreaterThan(0.4375);
  });

  it('a one-hole chain is straight across at its x', () => {
    const lay = unfold(angle(4, 4, 0.5), [
      { id: 'A', element: 'leg-a', x: 3, gauge: 2, deducted: 0.875 },
      { id: 'F', element: 'leg-b', x: 0, gauge: 2, deducted: 0.875 },
    ]);
    expect(sectionLineDistances(lay, [1])[0]).toBe(3);
  });
});
