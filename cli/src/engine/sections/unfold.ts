import { centrelinePath } from './centrelinePath.js';
import { assertSection } from './assertSection.js';
import { SectionError } from './sectionError.js';
import { sectionGrossArea } from './sectionGrossArea.js';
import type { Section, SectionHoleInput, SectionLayout, UnfoldedHole } from './types.js';

/** Options of {@link unfold}. */
export interface UnfoldOptions {
  /** Tabulated gross area (all pieces); it replaces the elements' sum as the Ag chains start from. */
  readonly tabulatedAg?: number;
}

/**
 * Unfolds a section with its holes into the flat layout the chain search works on: each hole's
 * position along its element's centreline (u = datum + gauge), its unfolded y for drawing, the
 * thickness of the element it lies in, and the centreline gauge between every pair of holes. A gauge
 * across an angle's heel comes out as the sum of the gauges from the heel less the thickness (AISC 360
 * B4.3b); web-to-flange junctions are treated the same way, along the centrelines (README.md).
 *
 * @param section - the section
 * @param holes - the holes, with gauges as the elements' `gaugeFrom` says
 * @param options - tabulated gross area
 * @returns the layout
 * @throws SectionError for an unknown element, a hole outside its element, a bad width or a repeated id
 * @example
 * // L4x4x1/2, holes 2.5 from the heel in each leg: unfolded gauge 2.5 + 2.5 − 0.5 = 4.5
 * const lay = unfold(angle(4, 4, 0.5), [
 *   { id: 'A', element: 'leg-a', x: 0, gauge: 2.5, deducted: 0.875 },
 *   { id: 'B', element: 'leg-b', x: 1.5, gauge: 2.5, deducted: 0.875 },
 * ]);
 * lay.gauges[0]?.[1]                       // → 4.5
 * lay.holes.map((h) => h.y)                // → [1.5, 6] (from the toe of leg a; unfolded width 7.5 = a + b − t)
 */
export function unfold(
  section: Section,
  holes: readonly SectionHoleInput[],
  options: UnfoldOptions = {},
): SectionLayout {
  assertSection(section);
  const byId = new Map(section.elements.map((e) => [e.id, e]));
  const seen = new Set<string>();
  let scale = 1;
  for (const e of section.elements) scale = Math.max(scale, e.span, Math.abs(e.unfoldOffset));
  const placed: UnfoldedHole[] = holes.map((h, index) => {
    const e = byId.get(h.element);
    if (!e)
      throw new SectionError(
        'unknown-element',
        `hole "${h.id}": no element "${h.element}" in ${section.designation}`,
      );
    if (seen.has(h.id)) throw new SectionError('invalid-argument', `hole id "${h.id}" is used twice`);
    seen.add(h.id);
    if (!(Number.isFinite(h.deducted) && h.deducted > 0)) {
      throw new SectionError(
        'invalid-argument',
        `hole "${h.id}": deducted width must be positive, got ${h.deducted}`,
      );
    }
    if (!Number.isFinite(h.x) || !Number.isFinite(h.gauge)) {
      throw new SectionError('invalid-argument', `hole "${h.id}": x and gauge must be finite numbers`);
    }
    const u = e.datum + h.gauge;
    if (!(u > 0 && u < e.span)) {
      throw new SectionError(
        'hole-outside-element',
        `hole "${h.id}": gauge ${h.gauge} from the ${e.gaugeFrom} puts it outside element "${e.id}"`,
      );
    }
    scale = Math.max(scale, Math.abs(h.x));
    return {
      id: h.id,
      index,
      element: e.id,
      x: h.x,
      u,
      y: e.unfoldOffset + e.unfoldSense * u,
      thickness: e.thickness,
      deducted: h.deducted,
    };
  });
  const n = placed.length;
  const gauges = placed.map(() => new Array<number>(n).fill(0));
  const legThickness = placed.map((h) => new Array<number>(n).fill(h.thickness));
  const legJunctions = placed.map(() => placed.map((): readonly string[] => []));
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      const a = placed[i]!;
      const b = placed[j]!;
      const path = centrelinePath(section, a, b);
      gauges[i]![j] = gauges[j]![i] = path.distance;
      // A leg across a junction takes its s²/4g term at the thinnest element it passes through.
      const t = Math.min(...path.elements.map((id) => byId.get(id)!.thickness));
      legThickness[i]![j] = legThickness[j]![i] = t;
      legJunctions[i]![j] = path.junctions;
      legJunctions[j]![i] = [...path.junctions].reverse();
    }
  }
  return {
    section,
    holes: placed,
    gauges,
    legThickness,
    legJunctions,
    Ag: sectionGrossArea(section, options.tabulatedAg).used,
    tolerance: 1e-9 * scale,
  };
}
