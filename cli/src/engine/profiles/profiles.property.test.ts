import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { plateSection } from '../sections/plateSection.js';
import { sectionChains } from '../sections/sectionChains.js';
import { unfold } from '../sections/unfold.js';
import type { LoadDirection } from '../types.js';
import { EN_1993_1_1 } from './en1993Profile.js';
import { en1993SectionNetArea } from './en1993SectionNetArea.js';

// AISC 360 Table J3.3M standard holes for M16, M20, M22 (conformance/SOURCES.md, Tables, published: 18, 22, 24 mm)
// plus the 2 mm damage allowance of B4.3b (cli/docs/method.md §2). EN 1090-2 normal clearance gives the same d0.
const AISC_STANDARD_HOLE: Record<number, number> = { 16: 18, 20: 22, 22: 24 };

describe('EN 1993-1-1 vs AISC 360 on the same plate', () => {
  it('differ only by the 2 mm allowance per hole: same admissible chains, An_EN − An_AISC = 2·t·holes; EN takes the larger deduction', () => {
    const layoutCase = fc.record({
      bolt: fc.constantFrom(16, 20, 22),
      holes: fc.uniqueArray(fc.tuple(fc.integer({ min: 0, max: 4 }), fc.integer({ min: 1, max: 4 })), {
        minLength: 1,
        maxLength: 6,
        selector: ([x, y]) => `${x},${y}`,
      }),
      direction: fc.constantFrom<LoadDirection>('-x', '+x'),
    });
    fc.assert(
      fc.property(layoutCase, ({ bolt, holes, direction }) => {
        const t = 12;
        const place = (deducted: number) =>
          holes.map(([x, y], i) => ({ id: `h${i}`, element: 'plate', x: x * 40, gauge: y * 60, deducted }));
        const d0 = EN_1993_1_1.holeWidth({ boltDiameter: bolt }).deducted;
        expect(d0).toBe(AISC_STANDARD_HOLE[bolt]);
        const en = unfold(plateSection(300, t), place(d0));
        const aisc = unfold(plateSection(300, t), place(AISC_STANDARD_HOLE[bolt]! + 2));
        const enChains = sectionChains(en, direction, { k: 1000 });
        const aiscChains = sectionChains(aisc, direction, { k: 1000 });
        const key = (c: { holes: readonly string[] }) => [...c.holes].sort().join();
        expect(new Set(enChains.map(key))).toEqual(new Set(aiscChains.map(key)));
        const aiscByKey = new Map(aiscChains.map((c) => [key(c), c.netArea]));
        for (const c of enChains)
          expect(c.netArea - aiscByKey.get(key(c))!).toBeCloseTo(2 * t * c.holes.length, 9);
        const least = Math.min(...enChains.map((c) => c.netArea));
        expect(en1993SectionNetArea(en, direction).Anet).toBeCloseTo(Math.min(least, en.Ag), 9);
      }),
      { numRuns: 80 },
    );
  });
});
