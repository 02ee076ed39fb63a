import { positiveLength } from './positiveLength.js';
import { SectionError } from './sectionError.js';
import type { Section } from './types.js';

/**
 * A channel as a web and two flanges joined at the corners. Web holes are gauged from the back of
 * `flange-1`; flange holes from the web back. Centrelines meet tw/2 and tf/2 inside the corner, so a
 * flange gauge gf sits at u = gf − tw/2, a web gauge gw at u = gw − tf/2, and the centreline gauge
 * between them is gf + gw − (tw + tf)/2: the sum of the gauges less the thickness when tw = tf, as for
 * an angle (AISC 360 B4.3b; README.md). Gross area d·tw + 2(bf − tw)·tf, without fillets or flange slope.
 *
 * @param d - overall depth
 * @param bf - flange width
 * @param tf - flange thickness (average, for sloped flanges)
 * @param tw - web thickness
 * @returns the section (elements `flange-1`, `web`, `flange-2`, junctions `web-flange-1`, `web-flange-2`)
 * @example
 * channel(8, 2.26, 0.39, 0.22).elements.map((e) => e.span) // → [2.15, 7.61, 2.15]
 */
export function channel(d: number, bf: number, tf: number, tw: number): Section {
  positiveLength(d, 'channel: d');
  positiveLength(bf, 'channel: bf');
  positiveLength(tf, 'channel: tf');
  positiveLength(tw, 'channel: tw');
  if (!(2 * tf < d && tw < bf))
    throw new SectionError('invalid-argument', 'channel: need 2tf < d and tw < bf');
  const flangeSpan = bf - tw / 2;
  const webSpan = d - tf;
  return {
    shape: 'channel',
    designation: `C d ${d} × bf ${bf}, tf ${tf}, tw ${tw}`,
    pieces: 1,
    elements: [
      {
        id: 'flange-1',
        role: 'flange',
        thickness: tf,
        areaWidth: bf - tw,
        span: flangeSpan,
        datum: -tw / 2,
        gaugeFrom: 'web back',
        unfoldOffset: flangeSpan,
        unfoldSense: -1,
      },
      {
        id: 'web',
        role: 'web',
        thickness: tw,
        areaWidth: d,
        span: webSpan,
        datum: -tf / 2,
        gaugeFrom: 'back of flange-1',
        unfoldOffset: flangeSpan,
        unfoldSense: 1,
      },
      {
        id: 'flange-2',
        role: 'flange',
        thickness: tf,
        areaWidth: bf - tw,
        span: flangeSpan,
        datum: -tw / 2,
        gaugeFrom: 'web back',
        unfoldOffset: flangeSpan + webSpan,
        unfoldSense: 1,
      },
    ],
    junctions: [
      {
        id: 'web-flange-1',
        attachments: [
          { element: 'flange-1', u: 0 },
          { element: 'web', u: 0 },
        ],
      },
      {
        id: 'web-flange-2',
        attachments: [
          { element: 'web', u: webSpan },
          { element: 'flange-2', u: 0 },
        ],
      },
    ],
  };
}
