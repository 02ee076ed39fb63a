import { assertSection } from './assertSection.js';
import type { ElementRole, Section } from './types.js';

/** One element of a section as a strip of the unfolded drawing. */
export interface UnfoldedStrip {
  readonly element: string;
  readonly role: ElementRole;
  /** Unfolded y of the strip's two long edges, y0 < y1. */
  readonly y0: number;
  readonly y1: number;
  readonly thickness: number;
}

/** A junction as lines in the unfolded drawing: one y per element it joins. */
export interface UnfoldedJunctionLine {
  readonly junction: string;
  readonly lines: readonly { readonly element: string; readonly y: number }[];
}

/**
 * The unfolded section as a drawing needs it: one strip per element over its centreline span, with
 * its thickness, and the junction lines (for a web meeting a flange's middle, one line inside the
 * flange strip and one at the web strip's edge, so the drawing can tie them together).
 *
 * @param section - the section
 * @returns strips in element order and junction lines
 * @example
 * unfoldedStrips(angle(4, 4, 0.5)).strips.map((s) => [s.y0, s.y1]) // → [[0, 3.75], [3.75, 7.5]]
 */
export function unfoldedStrips(section: Section): {
  strips: UnfoldedStrip[];
  junctions: UnfoldedJunctionLine[];
} {
  assertSection(section);
  const byId = new Map(section.elements.map((e) => [e.id, e]));
  const strips = section.elements.map((e) => {
    const a = e.unfoldOffset;
    const b = e.unfoldOffset + e.unfoldSense * e.span;
    return { element: e.id, role: e.role, y0: Math.min(a, b), y1: Math.max(a, b), thickness: e.thickness };
  });
  const junctions = section.junctions.map((j) => ({
    junction: j.id,
    lines: j.attachments.map((t) => {
      const e = byId.get(t.element)!;
      return { element: t.element, y: e.unfoldOffset + e.unfoldSense * t.u };
    }),
  }));
  return { strips, junctions };
}
