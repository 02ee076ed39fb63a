import { describe, expect, it } from 'vitest';
import { analyseSection } from './analyseSection.js';
import { angle } from './angle.js';
import { centrelinePath } from './centrelinePath.js';
import { channel } from './channel.js';
import { sectionChain } from './sectionChain.js';
import { sectionChains } from './sectionChains.js';
import { SectionError } from './sectionError.js';
import { sectionGrossArea } from './sectionGrossArea.js';
import { sectionRejection } from './sectionRejection.js';
import {
  quimbyEx2Holes,
  quimbyEx3Holes,
  twoL6x6,
  twoL6x6Holes,
  w12x72,
  w12x72Holes,
  w14x68,
  wt8x25,
  wt8x25Holes,
} from './sections.fixtures.js';
import { unfold } from './unfold.js';

describe('unfold and centreline gauges', () => {
  it('gives the gauge across an angle heel as the sum of the gauges less the thickness (AISC 360 B4.3b)', () => {
    const lay = unfold(angle(4, 4, 0.5), [
      { id: 'A', element: 'leg-a', x: 0, gauge: 2.5, deducted: 0.875 },
      { id: 'B', element: 'leg-b', x: 1.5, gauge: 2.5, deducted: 0.875 },
    ]);
    expect(lay.gauges[0]?.[1]).toBeCloseTo(4.5, 12);
    // Unfolded width a + b − t = 7.5 (B4.3b); holes at 1.5 and 6 from the toe of leg a.
    expect(lay.holes.map((h) => h.y)).toEqual([expect.closeTo(1.5, 12), expect.closeTo(6, 12)]);
    expect(lay.holes[1]!.y - lay.holes[0]!.y).toBeCloseTo(lay.gauges[0]![1]!, 12);
  });

  it('takes a web-to-flange gauge along the centrelines: |gf| + gw − tf/2 for a W-shape', () => {
    const path = centrelinePath(
      w14x68,
      { element: 'flange-1', u: 5 + 2.75 },
      { element: 'web', u: 0.86 - 0.36 },
    );
    expect(path.distance).toBeCloseTo(3.25, 12);
    expect(path.junctions).toEqual(['web-flange-1']);
  });

  it('treats a channel corner like a heel: gf + gw − t when tw = tf', () => {
    const c = channel(8, 3, 0.4, 0.4);
    const path = centrelinePath(c, { element: 'flange-1', u: 1.5 - 0.2 }, { element: 'web', u: 2 - 0.2 });
    expect(path.distance).toBeCloseTo(1.5 + 2 - 0.4, 12);
  });

  it('rejects a hole whose gauge puts it outside its element', () => {
    expect(() =>
      unfold(angle(4, 4, 0.5), [{ id: 'A', element: 'leg-a', x: 0, gauge: 4.2, deducted: 1 }]),
    ).toThrow(SectionError);
    expect(() =>
      unfold(angle(4, 4, 0.5), [{ id: 'A', element: 'web', x: 0, gauge: 2, deducted: 1 }]),
    ).toThrow(/no element "web"/);
  });
});

describe('gross area', () => {
  it('uses a tabulated Ag over the elements and reports the difference', () => {
    const g = sectionGrossArea(twoL6x6, 14.26);
    expect(g.fromElements).toBeCloseTo(2 * (6 + 6 - 0.625) * 0.625, 12);
    expect(g.used).toBe(14.26);
    expect(g.difference).toBeCloseTo(14.26 - 14.21875, 12);
  });
});

describe('published section net areas', () => {
  it('R4 Quimby, Beginner’s Guide, failure-path Example 2: W14x68 web chain An = 19.38 in²', () => {
    const lay = unfold(w14x68, quimbyEx2Holes, { tabulatedAg: 20.0 });
    const chain = sectionChain(lay, [0, 1, 2]);
    const three = expect.closeTo(3, 12);
    expect(chain.legs.map((l) => [l.s, l.g, l.thickness])).toEqual([
      [3, three, 0.415],
      [3, three, 0.415],
    ]);
    expect(chain.netArea).toBeCloseTo(19.38, 2);
  });

  it('R5 Quimby Example 3: four flange holes straight 17.12 in²; with two web holes 16.86 in² (web thickness on the junction legs)', () => {
    const result = analyseSection(w14x68, quimbyEx3Holes, { tabulatedAg: 20.0, directions: ['-x'] });
    const [dir] = result.directions;
    expect(dir!.governing!.holes).toEqual(['A', 'B', 'J', 'P', 'S', 'T']);
    expect(dir!.governing!.netArea).toBeCloseTo(16.86, 2);
    const junctionLegs = dir!.governing!.legs.filter((l) => l.junctions.length > 0);
    expect(junctionLegs.map((l) => [l.s, l.g, l.thickness])).toEqual([
      [3, expect.closeTo(3.25, 12), 0.415],
      [3, expect.closeTo(3.25, 12), 0.415],
    ]);
    const flangesOnly = dir!.leastChains.find((c) => c.holes.join() === 'A,B,S,T');
    expect(flangesOnly?.netArea).toBeCloseTo(17.12, 2);
  });

  it('R6 AISC teaching calc (360-16), W12x72 through both flanges: An = 17.6 in²', () => {
    const result = analyseSection(w12x72, w12x72Holes, { tabulatedAg: 21.1 });
    expect(result.An).toBeCloseTo(17.6, 1);
    expect(result.directions[0]!.governing!.holes).toHaveLength(4);
  });

  it('R6, 2L6x6x5/8 with one line of 9 bolts in one leg of each angle: An = 13.01 in²', () => {
    const result = analyseSection(twoL6x6, twoL6x6Holes, { tabulatedAg: 14.26 });
    expect(result.An).toBeCloseTo(13.01, 2);
    expect(result.grossArea.difference).toBeCloseTo(0.04125, 10);
  });

  it('R6, WT8x25 flange bolted: An = 5.87 in² (published; 7.37 − 2(1.1875)(0.628) = 5.8785)', () => {
    const result = analyseSection(wt8x25, wt8x25Holes, { tabulatedAg: 7.37 });
    expect(Math.abs(result.An - 5.87)).toBeLessThanOrEqual(0.01);
  });

  it('R7 Steel Buildings in Europe, Part 8, Worked Example 3: L120×80×12, three M20 in one row, Anet = 2006 mm²', () => {
    // d0 = 22 mm (published); the row's gauge (50 mm in the 120 leg) is placed: Anet does not depend on it.
    const holes = [0, 70, 140].map((x, i) => ({ id: `M${i}`, element: 'leg-a', x, gauge: 50, deducted: 22 }));
    const result = analyseSection(angle(120, 80, 12), holes, { tabulatedAg: 2270 });
    expect(result.An).toBe(2006);
  });
});

describe('admissibility across junctions (cli/docs/method.md §4)', () => {
  const lay = unfold(angle(4, 4, 0.5), [
    { id: 'A', element: 'leg-a', x: 0, gauge: 2.5, deducted: 0.875 },
    { id: 'B', element: 'leg-b', x: 3, gauge: 2.5, deducted: 0.875 },
    { id: 'C', element: 'leg-b', x: 1, gauge: 3.25, deducted: 0.875 },
  ]);

  it('blocks a chain when a hole lies on the loaded side of the line across the heel', () => {
    // Line from A (x 0, y 1.5) to B (x 3, y 6); C at y 6.75 lies beyond B: judged at B's x = 3.
    expect(sectionRejection(lay, [0, 1], '-x')).toEqual({
      direction: '-x',
      blockingHole: 'C',
      reason: 'loaded-side',
    });
    expect(sectionRejection(lay, [0, 1], '+x')).toBeNull();
  });

  it('reports a hole exactly on the line as on-line', () => {
    const on = unfold(angle(4, 4, 0.5), [
      { id: 'A', element: 'leg-a', x: 0, gauge: 2.5, deducted: 0.875 },
      { id: 'B', element: 'leg-b', x: 0, gauge: 2.5, deducted: 0.875 },
      { id: 'C', element: 'leg-b', x: 0, gauge: 3.25, deducted: 0.875 },
    ]);
    expect(sectionRejection(on, [0, 1], '-x')?.reason).toBe('on-line');
  });

  it('lists chains least first and refuses layouts above the limit', () => {
    const chains = sectionChains(lay, null);
    for (let i = 1; i < chains.length; i++)
      expect(chains[i]!.netArea).toBeGreaterThanOrEqual(chains[i - 1]!.netArea);
    expect(() => sectionChains(lay, null, { limit: 3 })).toThrow(/more than 3 chains/);
  });
});
