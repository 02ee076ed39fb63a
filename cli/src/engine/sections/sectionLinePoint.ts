import type { SectionLayout } from './types.js';

/** Where a hole meets one leg of a section chain's fracture line. */
export interface LegProjection {
  /** Centreline distance from the hole to the leg's path (0 when the hole lies on it). */
  readonly offset: number;
  /** Distance along the path from the leg's first hole to the point nearest the hole, in [0, length]. */
  readonly along: number;
  /** Centreline length of the path (the leg's gauge). */
  readonly length: number;
  /** x of the fracture line at that point (x varies linearly along the path). */
  readonly x: number;
}

/**
 * Projects a hole onto one leg of a section chain. Sections are trees of elements, so the centreline
 * distances form a tree metric: the hole's distance to the path a–b is (D(p,a) + D(p,b) − D(a,b)) / 2
 * and it meets the path (D(a,p) + D(a,b) − D(b,p)) / 2 from a (README.md §6).
 *
 * @param layout - the unfolded section
 * @param a - position of the leg's first hole in `layout.holes`
 * @param b - position of the leg's second hole
 * @param p - position of the hole projected
 * @returns offset, position along the path and the line's x there
 * @example
 * // angle, A (leg a, x 0) and B (leg b, x 3) 6 apart along the centrelines, C in leg b 4 from A
 * legProjection(lay, 0, 1, 2) // → { offset: 0, along: 4, length: 6, x: 2 }
 */
export function legProjection(layout: SectionLayout, a: number, b: number, p: number): LegProjection {
  const D = layout.gauges;
  const holes = layout.holes;
  const length = D[a]![b]!;
  const offset = (D[p]![a]! + D[p]![b]! - length) / 2;
  const along = Math.min(length, Math.max(0, (D[a]![p]! + length - D[b]![p]!) / 2));
  const x = holes[a]!.x + ((holes[b]!.x - holes[a]!.x) * along) / length;
  return { offset, along, length, x };
}

/**
 * The part of a section chain's fracture line a hole is judged against (cli/docs/method.md §4, README.md §6): the
 * nearest leg (on a tie, a leg inside the hole's own element), and the line's x where the hole meets
 * it. Beyond the end holes and along elements the chain does not enter the line runs straight across
 * from where it leaves the legs, so a hole there is judged against that point's x. A chain of one
 * hole is straight across at its x.
 *
 * @param layout - the unfolded section
 * @param chain - positions of the chain's holes in `layout.holes`
 * @param legs - the chain's legs ({@link chainLegPairs})
 * @param p - position of a hole not in the chain
 * @returns the line's x at the hole and the hole's centreline distance to the nearest leg
 *   (0 with no legs: the straight line passes the hole's own position)
 * @example
 * // angle, chain A (leg a, x 0) – B (leg b, x 3), C in leg b between them, 4 of the 6 from A
 * sectionLineAt(lay, [0, 1], [[0, 1]], 2) // → { x: 2, offset: 0 }
 */
export function sectionLineAt(
  layout: SectionLayout,
  chain: readonly number[],
  legs: readonly (readonly [number, number])[],
  p: number,
): { x: number; offset: number } {
  const holes = layout.holes;
  const eps = layout.tolerance;
  const h = holes[p]!;
  let x = holes[chain[0]!]!.x;
  let offset = legs.length === 0 ? 0 : Number.POSITIVE_INFINITY;
  let own = false;
  for (const [a, b] of legs) {
    const leg = legProjection(layout, a, b, p);
    const inOwn = holes[a]!.element === h.element && holes[b]!.element === h.element;
    if (leg.offset < offset - eps || (Math.abs(leg.offset - offset) <= eps && inOwn && !own)) {
      offset = leg.offset;
      own = inOwn;
      x = leg.x;
    }
  }
  return { x, offset };
}
