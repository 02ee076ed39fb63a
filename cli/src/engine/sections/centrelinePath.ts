import { SectionError } from './sectionError.js';
import type { Section } from './types.js';

/** A point on a section's centreline: an element and a position along it. */
export interface CentrelinePoint {
  readonly element: string;
  readonly u: number;
}

/** The centreline path between two points of a section. */
export interface CentrelinePath {
  /** Length along the centrelines. */
  readonly distance: number;
  /** Elements the path runs through, in order (one entry when both points are in one element). */
  readonly elements: readonly string[];
  /** Junctions crossed, in order. */
  readonly junctions: readonly string[];
}

/**
 * The path along the centrelines between two points of a section. Sections are trees of elements
 * (checked by {@link assertSection}), so the path is unique: inside one element it is |u₁ − u₂|; across
 * junctions it runs to each junction's point on the element, then on along the next element.
 *
 * @param section - the section
 * @param a - first point
 * @param b - second point
 * @returns distance, elements passed through and junctions crossed
 * @throws SectionError ('unknown-element') when a point names an element the section lacks
 * @example
 * // L6x6x5/8, holes 2.25 from the heel in each leg: 2.25 + 2.25 − 0.625 (AISC 360 B4.3b)
 * centrelinePath(angle(6, 6, 0.625), { element: 'leg-a', u: 1.9375 }, { element: 'leg-b', u: 1.9375 }).distance
 * // → 3.875
 */
export function centrelinePath(section: Section, a: CentrelinePoint, b: CentrelinePoint): CentrelinePath {
  const known = new Set(section.elements.map((e) => e.id));
  for (const p of [a, b]) {
    if (!known.has(p.element)) {
      throw new SectionError('unknown-element', `no element "${p.element}" in ${section.designation}`);
    }
  }
  if (a.element === b.element) {
    return { distance: Math.abs(a.u - b.u), elements: [a.element], junctions: [] };
  }
  // Breadth-first search over elements; each step records the junction used and where it enters.
  const via = new Map<string, { from: string; junction: string; uFrom: number; uTo: number }>();
  const seen = new Set([a.element]);
  const queue = [a.element];
  while (queue.length > 0) {
    const current = queue.shift()!;
    if (current === b.element) break;
    for (const j of section.junctions) {
      const here = j.attachments.find((t) => t.element === current);
      if (!here) continue;
      for (const next of j.attachments) {
        if (seen.has(next.element)) continue;
        seen.add(next.element);
        via.set(next.element, { from: current, junction: j.id, uFrom: here.u, uTo: next.u });
        queue.push(next.element);
      }
    }
  }
  if (!via.has(b.element)) {
    throw new SectionError(
      'invalid-argument',
      `elements "${a.element}" and "${b.element}" are not connected`,
    );
  }
  const elements: string[] = [b.element];
  const junctions: string[] = [];
  let distance = 0;
  let current = b.element;
  let u = b.u;
  while (current !== a.element) {
    const step = via.get(current)!;
    distance += Math.abs(u - step.uTo);
    junctions.unshift(step.junction);
    current = step.from;
    elements.unshift(current);
    u = step.uFrom;
  }
  distance += Math.abs(u - a.u);
  return { distance, elements, junctions };
}
