import { positiveLength } from './positiveLength.js';
import { SectionError } from './sectionError.js';
import type { Section } from './types.js';

/**
 * A doubly symmetric I-shape (W, M, S, HP, or welded) as two flanges and a web. Flange holes are
 * gauged from the web centreline (signed: negative toward the flange's u = 0 tip); web holes from the
 * back of `flange-1`. The web's centreline runs between the flanges' mid-thicknesses, so a web gauge
 * g sits at u = g − tf/2 and the centreline gauge from a flange hole at gf to a web hole at gw is
 * |gf| + gw − tf/2 (see README.md). Gross area 2·bf·tf + (d − 2tf)·tw, without fillets.
 *
 * @param d - overall depth
 * @param bf - flange width
 * @param tf - flange thickness
 * @param tw - web thickness
 * @returns the section (elements `flange-1`, `web`, `flange-2`, junctions `web-flange-1`, `web-flange-2`)
 * @example
 * const w = wShape(14.0, 10.0, 0.72, 0.415);
 * w.elements.reduce((sum, e) => sum + e.areaWidth * e.thickness, 0) // → 19.6124 (tabulated W14x68: 20.0, the rest is fillets)
 */
export function wShape(d: number, bf: number, tf: number, tw: number): Section {
  positiveLength(d, 'wShape: d');
  positiveLength(bf, 'wShape: bf');
  positiveLength(tf, 'wShape: tf');
  positiveLength(tw, 'wShape: tw');
  if (!(2 * tf < d && tw < bf))
    throw new SectionError('invalid-argument', 'wShape: need 2tf < d and tw < bf');
  const webSpan = d - tf;
  const flange = (id: string, offset: number) =>
    ({
      id,
      role: 'flange',
      thickness: tf,
      areaWidth: bf,
      span: bf,
      datum: bf / 2,
      gaugeFrom: 'web centreline (signed)',
      unfoldOffset: offset,
      unfoldSense: 1,
    }) as const;
  return {
    shape: 'w-shape',
    designation: `I d ${d} × bf ${bf}, tf ${tf}, tw ${tw}`,
    pieces: 1,
    elements: [
      flange('flange-1', 0),
      {
        id: 'web',
        role: 'web',
        thickness: tw,
        areaWidth: d - 2 * tf,
        span: webSpan,
        datum: -tf / 2,
        gaugeFrom: 'back of flange-1',
        unfoldOffset: bf,
        unfoldSense: 1,
      },
      flange('flange-2', bf + webSpan),
    ],
    junctions: [
      {
        id: 'web-flange-1',
        attachments: [
          { element: 'flange-1', u: bf / 2 },
          { element: 'web', u: 0 },
        ],
      },
      {
        id: 'web-flange-2',
        attachments: [
          { element: 'web', u: webSpan },
          { element: 'flange-2', u: bf / 2 },
        ],
      },
    ],
  };
}
