import { positiveLength } from './positiveLength.js';
import type { Section } from './types.js';

/**
 * A flat plate as a one-element section, so a plate and a shape go through the same search. The
 * gauge of a hole is its distance from the edge y = 0 (the plate's own y).
 *
 * @param width - gross width across the load
 * @param t - thickness
 * @returns the section: one element `plate` of span `width`
 * @example
 * plateSection(14, 0.5).elements[0]?.span // → 14
 */
export function plateSection(width: number, t: number): Section {
  positiveLength(width, 'plateSection: width');
  positiveLength(t, 'plateSection: t');
  return {
    shape: 'plate',
    designation: `PL ${width} × ${t}`,
    pieces: 1,
    elements: [
      {
        id: 'plate',
        role: 'plate',
        thickness: t,
        areaWidth: width,
        span: width,
        datum: 0,
        gaugeFrom: 'edge y = 0',
        unfoldOffset: 0,
        unfoldSense: 1,
      },
    ],
    junctions: [],
  };
}
