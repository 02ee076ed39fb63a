import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { leastChains } from '../chains/leastChains.js';
import { analyseSection } from './analyseSection.js';
import { angle } from './angle.js';
import { plateSection } from './plateSection.js';
import { sectionChains } from './sectionChains.js';
import { unfold } from './unfold.js';
import type { LoadDirection } from '../types.js';
import type { SectionHoleInput } from './types.js';

interface PlateHole {
  readonly id: string;
  readonly x: number;
  readonly y: number;
}

/**
 * An independent plate reference written straight from cli/docs/method.md §3–4 (brute force over one hole or
 * none per gauge line, holes in y order, line straight to the edges, every other hole strictly on the
 * far side): least net area of a plate for a direction, or Ag when no chain can form.
 */
function plateLeastNetArea(
  width: number,
  t: number,
  d: number,
  holes: PlateHole[],
  dir: LoadDirection,
): number {
  const ys = [...new Set(holes.map((h) => h.y))].sort((a, b) => a - b);
  const lines = ys.map((y) => holes.filter((h) => h.y === y));
  const sign = dir === '-x' ? 1 : -1;
  let best = width * t;
  const pick: PlateHole[] = [];
  const lineX = (h: PlateHole): number => {
    const after = pick.findIndex((c) => c.y >= h.y);
    if (after === -1) return pick[pick.length - 1]!.x;
    const b = pick[after]!;
    if (after === 0 || b.y === h.y) return b.x;
    const a = pick[after - 1]!;
    return a.x + ((b.x - a.x) * (h.y - a.y)) / (b.y - a.y);
  };
  const visit = (l: number): void => {
    if (l === lines.length) {
      if (pick.length === 0) return;
      for (const h of holes) if (!pick.includes(h) && !(sign * (h.x - lineX(h)) > 1e-9)) return;
      let wn = width - pick.length * d;
      for (let i = 1; i < pick.length; i++) {
        const s = pick[i]!.x - pick[i - 1]!.x;
        wn += (s * s) / (4 * (pick[i]!.y - pick[i - 1]!.y));
      }
      best = Math.min(best, wn * t);
      return;
    }
    visit(l + 1);
    for (const h of lines[l]!) {
      pick.push(h);
      visit(l + 1);
      pick.pop();
    }
  };
  visit(0);
  return best;
}

// Holes on a coarse grid so that repeated gauge lines and equal x (on-line cases) occur often.
const plateCase = fc.record({
  holes: fc.uniqueArray(fc.tuple(fc.integer({ min: 0, max: 4 }), fc.integer({ min: 1, max: 5 })), {
    minLength: 1,
    maxLength: 7,
    selector: ([x, y]) => `${x},${y}`,
  }),
  direction: fc.constantFrom<LoadDirection>('-x', '+x'),
});

describe('section search properties', () => {
  it('a one-element section gives the plain plate result (cli/docs/method.md §3–4 brute force)', () => {
    fc.assert(
      fc.property(plateCase, ({ holes, direction }) => {
        const plate = holes.map(([x, y], i) => ({ id: `h${i}`, x: x * 1.5, y: y * 2 }));
        const input: SectionHoleInput[] = plate.map((h) => ({
          id: h.id,
          element: 'plate',
          x: h.x,
          gauge: h.y,
          deducted: 0.875,
        }));
        const result = analyseSection(plateSection(12, 0.5), input, { directions: [direction] });
        expect(result.An).toBeCloseTo(plateLeastNetArea(12, 0.5, 0.875, plate, direction), 9);
      }),
      { numRuns: 150 },
    );
  });

  it('a one-element section gives the core plate search’s k least chains (leastChains, net width × t)', () => {
    fc.assert(
      fc.property(plateCase, ({ holes, direction }) => {
        const placed = holes.map(([x, y], i) => ({
          id: `h${i}`,
          index: i,
          x: x * 1.5,
          y: y * 2,
          deducted: 0.875,
        }));
        const core = leastChains({ width: 12, thickness: 0.5, holes: placed }, direction, 5);
        const lay = unfold(
          plateSection(12, 0.5),
          placed.map((h) => ({ id: h.id, element: 'plate', x: h.x, gauge: h.y, deducted: h.deducted })),
        );
        const ours = sectionChains(lay, direction, { k: 5 });
        expect(ours.map((c) => c.netArea)).toEqual(core.map((c) => expect.closeTo(c.netArea, 9)));
      }),
      { numRuns: 150 },
    );
  });

  it('an angle with its legs swapped gives the same chains; mirrored in x with the direction reversed, the same An', () => {
    const angleCase = fc.record({
      a: fc.uniqueArray(fc.tuple(fc.integer({ min: 0, max: 3 }), fc.integer({ min: 1, max: 3 })), {
        maxLength: 4,
        selector: ([x, g]) => `${x},${g}`,
      }),
      b: fc.uniqueArray(fc.tuple(fc.integer({ min: 0, max: 3 }), fc.integer({ min: 1, max: 2 })), {
        maxLength: 3,
        selector: ([x, g]) => `${x},${g}`,
      }),
      direction: fc.constantFrom<LoadDirection>('-x', '+x'),
    });
    fc.assert(
      fc.property(angleCase, ({ a, b, direction }) => {
        if (a.length + b.length === 0) return;
        const hole = (leg: string, [x, g]: [number, number], i: number): SectionHoleInput => ({
          id: `${leg}${i}`,
          element: leg,
          x: x * 1.5,
          gauge: 0.5 + g * 1.25,
          deducted: 0.875,
        });
        const holes = [...a.map((h, i) => hole('leg-a', h, i)), ...b.map((h, i) => hole('leg-b', h, i + 10))];
        const swap = (h: SectionHoleInput): SectionHoleInput => ({
          ...h,
          element: h.element === 'leg-a' ? 'leg-b' : 'leg-a',
        });
        const base = analyseSection(angle(5, 3.5, 0.5), holes, { directions: [direction] });
        const swapped = analyseSection(angle(3.5, 5, 0.5), holes.map(swap), { directions: [direction] });
        const mirrored = analyseSection(
          angle(5, 3.5, 0.5),
          holes.map((h) => ({ ...h, x: -h.x })),
          { directions: [direction === '-x' ? '+x' : '-x'] },
        );
        expect(swapped.An).toBeCloseTo(base.An, 9);
        expect(mirrored.An).toBeCloseTo(base.An, 9);
        const ids = (r: typeof base) => r.directions[0]!.leastChains.map((c) => [...c.holes].sort().join());
        const areas = (r: typeof base) => r.directions[0]!.leastChains.map((c) => c.netArea);
        expect(areas(swapped)).toEqual(areas(base).map((v) => expect.closeTo(v, 9)));
        // Where the least chain is unique, it is the same set of holes after the swap.
        const least = areas(base);
        if (least.length > 0 && !(least.length > 1 && least[1]! - least[0]! < 1e-9)) {
          expect(ids(swapped)[0]).toBe(ids(base)[0]);
        }
      }),
      { numRuns: 100 },
    );
  });
});
