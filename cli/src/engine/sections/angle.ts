import { positiveLength } from './positiveLength.js';
import { SectionError } from './sectionError.js';
import type { Section } from './types.js';

/** Options of {@link angle}. */
export interface AngleOptions {
  /** Identical angles acting together (2 for a double angle back to back); default 1. */
  readonly pieces?: number;
}

/**
 * An angle as two legs joined at the heel. Leg `leg-a` is `a` long, leg `leg-b` is `b` long, both `t`
 * thick; hole gauges are measured from the heel (the back of the other leg), as detailers give them.
 *
 * Centrelines meet t/2 inside the heel, so a gauge g from the heel sits at u = g − t/2 and the
 * centreline gauge between holes in opposite legs is ga + gb − t (AISC 360 B4.3b). The unfolded width
 * is a + b − t (B4.3b) and the gross area (a + b − t)·t, without fillets or toe rounding.
 *
 * @param a - length of leg a
 * @param b - length of leg b
 * @param t - thickness
 * @param options - number of identical pieces
 * @returns the section (elements `leg-a`, `leg-b`, junction `heel`)
 * @example
 * const l = angle(6, 6, 0.625);
 * l.elements.map((e) => e.areaWidth * e.thickness) // → [3.75, 3.359375] (7.109375 in² in all)
 */
export function angle(a: number, b: number, t: number, options: AngleOptions = {}): Section {
  positiveLength(a, 'angle: a');
  positiveLength(b, 'angle: b');
  positiveLength(t, 'angle: t');
  if (!(t < a && t < b))
    throw new SectionError('invalid-argument', `angle: t ${t} must be less than both legs`);
  const pieces = options.pieces ?? 1;
  if (!(Number.isInteger(pieces) && pieces >= 1)) {
    throw new SectionError('invalid-argument', `angle: pieces must be a whole number ≥ 1, got ${pieces}`);
  }
  const spanA = a - t / 2;
  return {
    shape: 'angle',
    designation: `${pieces > 1 ? `${pieces}` : ''}L ${a} × ${b} × ${t}`,
    pieces,
    elements: [
      {
        id: 'leg-a',
        role: 'leg',
        thickness: t,
        areaWidth: a,
        span: spanA,
        datum: -t / 2,
        gaugeFrom: 'heel (back of leg b)',
        unfoldOffset: spanA,
        unfoldSense: -1,
      },
      {
        id: 'leg-b',
        role: 'leg',
        thickness: t,
        areaWidth: b - t,
        span: b - t / 2,
        datum: -t / 2,
        gaugeFrom: 'heel (back of leg a)',
        unfoldOffset: spanA,
        unfoldSense: 1,
      },
    ],
    junctions: [
      {
        id: 'heel',
        attachments: [
          { element: 'leg-a', u: 0 },
          { element: 'leg-b', u: 0 },
        ],
      },
    ],
  };
}
