import { SectionError } from './sectionError.js';
import type { Section } from './types.js';

/**
 * Checks that a section is one the section functions can work with: unique element ids, positive
 * thicknesses, spans and area widths, junction attachments on known elements within their spans, and
 * elements joined as a tree (connected, no loops), so that centreline paths are unique.
 *
 * @param section - the section, usually from a builder ({@link angle}, {@link wShape} …)
 * @returns the section
 * @throws SectionError ('invalid-argument' or 'unknown-element') naming the first problem
 * @example
 * assertSection(angle(4, 3, 0.375)).elements.length // → 2
 */
export function assertSection(section: Section): Section {
  if (section.elements.length === 0) throw new SectionError('invalid-argument', 'a section needs an element');
  if (!(Number.isInteger(section.pieces) && section.pieces >= 1)) {
    throw new SectionError('invalid-argument', `pieces must be a whole number ≥ 1, got ${section.pieces}`);
  }
  const spans = new Map<string, number>();
  for (const e of section.elements) {
    if (spans.has(e.id)) throw new SectionError('invalid-argument', `element id "${e.id}" is used twice`);
    for (const [name, v] of [
      ['thickness', e.thickness],
      ['span', e.span],
      ['areaWidth', e.areaWidth],
    ] as const) {
      if (!(Number.isFinite(v) && v > 0)) {
        throw new SectionError('invalid-argument', `element "${e.id}": ${name} must be positive, got ${v}`);
      }
    }
    spans.set(e.id, e.span);
  }
  // Union-find over elements: every junction attachment beyond the first must join two groups.
  const parent = new Map<string, string>([...spans.keys()].map((id) => [id, id]));
  const root = (id: string): string => {
    let r = id;
    while (parent.get(r) !== r) r = parent.get(r)!;
    return r;
  };
  let joins = 0;
  for (const j of section.junctions) {
    if (j.attachments.length < 2) {
      throw new SectionError('invalid-argument', `junction "${j.id}" must join at least two elements`);
    }
    const first = j.attachments[0]!;
    for (const t of j.attachments) {
      const span = spans.get(t.element);
      if (span === undefined) {
        throw new SectionError('unknown-element', `junction "${j.id}" names unknown element "${t.element}"`);
      }
      if (!(t.u >= 0 && t.u <= span)) {
        throw new SectionError('invalid-argument', `junction "${j.id}" lies outside element "${t.element}"`);
      }
      if (t === first) continue;
      const ra = root(first.element);
      const rb = root(t.element);
      if (ra === rb)
        throw new SectionError('invalid-argument', `junction "${j.id}" closes a loop of elements`);
      parent.set(rb, ra);
      joins += 1;
    }
  }
  if (joins !== section.elements.length - 1) {
    throw new SectionError('invalid-argument', 'the elements are not all joined into one section');
  }
  return section;
}
