import { describe, expect, it } from 'vitest';
import { twoL6x6, twoL6x6Holes, wt8x25, wt8x25Holes } from '../sections/sections.fixtures.js';
import { unfold } from '../sections/unfold.js';
import { blockShear } from './blockShear.js';
import { sectionBlockLayouts } from './sectionBlockLayouts.js';

describe('sectionBlockLayouts', () => {
  it('R6 2L6x6x5/8 (AISC teaching calc to 360-16): from the unfolded angle, Agv 32.66, Anv 22.04, Agt 4.69, Ant 4.07 in², φRn 706 kips', () => {
    const layouts = sectionBlockLayouts(unfold(twoL6x6, twoL6x6Holes), 'leg-a', '-x', 0);
    expect(layouts).toHaveLength(1);
    const r = blockShear(layouts[0]!, {
      standard: 'AISC 360',
      Fy: 36,
      Fu: 58,
      Ubs: 1,
      method: 'LRFD',
      units: 'in',
    });
    const g = r.governing!;
    // Published to 0.01 in².
    const published = { Agv: 32.66, Anv: 22.04, Agt: 4.69, Ant: 4.07 };
    for (const [name, value] of Object.entries(published)) {
      expect(Math.abs(g[name as keyof typeof published] - value), name).toBeLessThanOrEqual(0.01);
    }
    expect(Math.abs(g.strength.available - 706)).toBeLessThanOrEqual(0.5);
  });

  it('splits a tee flange at the stem: each half tears out toward its own tip (project-defined reading)', () => {
    const layouts = sectionBlockLayouts(unfold(wt8x25, wt8x25Holes), 'flange', '-x', -1.5);
    expect(layouts.map((l) => [l.width, l.freeEdges.low, l.freeEdges.high])).toEqual([
      [7.07 / 2, true, false],
      [7.07 / 2, false, true],
    ]);
    // Holes at ±2 from the stem: 1.535 from the low tip, 2 from the stem in the high half.
    expect(layouts[0]!.holes[0]!.y).toBeCloseTo(7.07 / 2 - 2, 12);
    expect(layouts[1]!.holes[0]!.y).toBeCloseTo(2, 12);
  });
});
