// Test fixtures built from published examples (see conformance/SOURCES.md R4–R7). Geometry not printed in a
// source is marked "derived" where it follows from published numbers, "placed" where the published
// value does not depend on it.
import { angle } from './angle.js';
import { tee } from './tee.js';
import { wShape } from './wShape.js';
import type { SectionHoleInput } from './types.js';

/** W14x68 as used by Quimby Examples 2 and 3: Ag 20.0, d 14.0, bf 10.0, tf 0.720, tw 0.415 in (published inputs). */
export const w14x68 = wShape(14.0, 10.0, 0.72, 0.415);

/** 7/8 in bolt: hole 7/8 + 1/16 + 1/16 damage = 1.0 in (Quimby, published). */
const d78 = 1.0;

/**
 * Quimby Example 2 (R4): three web holes, legs s = 3, g = 3 (published); gauges 4, 7, 10 in from the
 * flange back placed so that g = 3.
 */
export const quimbyEx2Holes: SectionHoleInput[] = [
  { id: 'A', element: 'web', x: 0, gauge: 4, deducted: d78 },
  { id: 'D', element: 'web', x: 3, gauge: 7, deducted: d78 },
  { id: 'K', element: 'web', x: 0, gauge: 10, deducted: d78 },
];

/**
 * Quimby Example 3 (R5): two flange holes in each flange at x = 0 and two web holes at x = 3 (s = 3,
 * published). The flange-to-web gauge 3.25 is published; the individual gauges are not in the part
 * seen, so flange holes are placed at ±2.75 from the web centreline and web holes 0.86 from each
 * flange back (derived: 2.75 + 0.86 − 0.72/2 = 3.25).
 */
export const quimbyEx3Holes: SectionHoleInput[] = [
  { id: 'A', element: 'flange-1', x: 0, gauge: -2.75, deducted: d78 },
  { id: 'B', element: 'flange-1', x: 0, gauge: 2.75, deducted: d78 },
  { id: 'J', element: 'web', x: 3, gauge: 0.86, deducted: d78 },
  { id: 'P', element: 'web', x: 3, gauge: 14.0 - 0.86, deducted: d78 },
  { id: 'S', element: 'flange-2', x: 0, gauge: -2.75, deducted: d78 },
  { id: 'T', element: 'flange-2', x: 0, gauge: 2.75, deducted: d78 },
];

/**
 * AISC teaching calc to 360-16 (R6), W12x72 bolted through both flanges: 1-1/8 in bolts, net-area
 * width 1.3125 in, 4 holes in the section, l = 12 in (published). Section properties d 12.3, bf 12.0,
 * tf 0.670, tw 0.430, Ag 21.1 (AISC Manual 15th ed., as the example uses). Gauge ±2.75 and five rows
 * at 3 in (placed: l = 12 in; the straight 4-hole chain does not depend on them).
 */
export const w12x72 = wShape(12.3, 12.0, 0.67, 0.43);
export const w12x72Holes: SectionHoleInput[] = ['flange-1', 'flange-2'].flatMap((element) =>
  [-2.75, 2.75].flatMap((gauge) =>
    [0, 3, 6, 9, 12].map((x) => ({
      id: `${element === 'flange-1' ? 'T' : 'B'}${gauge < 0 ? 'L' : 'R'}${x}`,
      element,
      x,
      gauge,
      deducted: 1.3125,
    })),
  ),
);

/**
 * R6, 2L6x6x5/8 (A36): 7/8 in bolts (net-area width 1.0 in), 9 bolts at 3 in in one leg of each angle
 * (published). Gauge 2.25 from the heel and end distance 2.125 in are derived from the published block
 * shear areas (Agt 4.69 = 2·(6 − 2.25)·0.625; Agv 32.66 = 2·(24 + 2.125)·0.625). Ag 14.26 in² tabulated.
 */
export const twoL6x6 = angle(6, 6, 0.625, { pieces: 2 });
export const twoL6x6Holes: SectionHoleInput[] = Array.from({ length: 9 }, (_, i) => ({
  id: `b${i + 1}`,
  element: 'leg-a',
  x: 2.125 + 3 * i,
  gauge: 2.25,
  deducted: 1.0,
}));

/**
 * R6, WT8x25 (A992) flange bolted: 1 in bolts, hole 1-1/8 in + 1/16 damage = 1.1875 in, l = 6 in
 * (published). bf 7.07, tf 0.628, d 8.13, tw 0.380, Ag 7.37 (AISC Manual 15th ed.). Gauge ±2.0 and three
 * rows at 3 in (placed).
 */
export const wt8x25 = tee(7.07, 0.628, 8.13, 0.38);
export const wt8x25Holes: SectionHoleInput[] = [-2, 2].flatMap((gauge) =>
  [0, 3, 6].map((x) => ({
    id: `${gauge < 0 ? 'L' : 'R'}${x}`,
    element: 'flange',
    x,
    gauge,
    deducted: 1.1875,
  })),
);
