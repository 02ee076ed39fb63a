import { positiveLength } from './positiveLength.js';
import { SectionError } from './sectionError.js';
import type { Section } from './types.js';

/**
 * A tee (WT, or a tee welded from plates) as a flange and a stem joined at the flange's middle.
 * Flange holes are gauged from the stem centreline (signed: negative toward the flange's u = 0 tip);
 * stem holes from the flange back. The stem's centreline starts at the flange's mid-thickness, so a
 * stem gauge g sits at u = g − tf/2 and the centreline gauge from a flange hole at gf to a stem hole
 * at gs is |gf| + gs − tf/2 (see README.md: the heel rule of AISC 360 B4.3b applied to the junction).
 * Gross area bf·tf + (d − tf)·tw, without fillets.
 *
 * @param bf - flange width
 * @param tf - flange thickness
 * @param d - overall depth
 * @param tw - stem thickness
 * @returns the section (elements `flange`, `stem`, junction `flange-stem`)
 * @example
 * const wt = tee(7.07, 0.628, 8.13, 0.380);
 * wt.elements[1]?.areaWidth // → 7.502 (8.13 − 0.628)
 */
export function tee(bf: number, tf: number, d: number, tw: number): Section {
  positiveLength(bf, 'tee: bf');
  positiveLength(tf, 'tee: tf');
  positiveLength(d, 'tee: d');
  positiveLength(tw, 'tee: tw');
  if (!(tf < d && tw < bf)) throw new SectionError('invalid-argument', 'tee: need tf < d and tw < bf');
  return {
    shape: 'tee',
    designation: `T bf ${bf} × tf ${tf}, d ${d} × tw ${tw}`,
    pieces: 1,
    elements: [
      {
        id: 'flange',
        role: 'flange',
        thickness: tf,
        areaWidth: bf,
        span: bf,
        datum: bf / 2,
        gaugeFrom: 'stem centreline (signed)',
        unfoldOffset: 0,
        unfoldSense: 1,
      },
      {
        id: 'stem',
        role: 'stem',
        thickness: tw,
        areaWidth: d - tf,
        span: d - tf / 2,
        datum: -tf / 2,
        gaugeFrom: 'flange back',
        unfoldOffset: bf,
        unfoldSense: 1,
      },
    ],
    junctions: [
      {
        id: 'flange-stem',
        attachments: [
          { element: 'flange', u: bf / 2 },
          { element: 'stem', u: 0 },
        ],
      },
    ],
  };
}
