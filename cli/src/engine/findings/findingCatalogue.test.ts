import { describe, expect, it } from 'vitest';
import { FINDING_CATALOGUE } from './findingCatalogue.js';

// The codes and names every part of Ligament relies on (team brief, "Finding codes"; LG106–LG304
// added for members of flat elements, block shear and the EN 1993 / CSA S16 profiles, issue 6).
const FIXED: readonly [string, string, string, string][] = [
  ['LG101', 'overstated-net-area', 'overstated', 'error'],
  ['LG102', 'overstated-effective-area', 'overstated', 'error'],
  ['LG103', 'overstated-strength', 'overstated', 'error'],
  ['LG104', 'overstated-shear-lag', 'overstated', 'error'],
  ['LG105', 'overstated-gross-area', 'overstated', 'error'],
  ['LG106', 'overstated-block-shear', 'overstated', 'error'],
  ['LG107', 'overstated-block-shear-area', 'overstated', 'error'],
  ['LG111', 'understated-net-area', 'understated', 'note'],
  ['LG112', 'understated-effective-area', 'understated', 'note'],
  ['LG113', 'understated-strength', 'understated', 'note'],
  ['LG114', 'understated-shear-lag', 'understated', 'note'],
  ['LG115', 'understated-gross-area', 'understated', 'note'],
  ['LG116', 'understated-block-shear', 'understated', 'note'],
  ['LG117', 'understated-block-shear-area', 'understated', 'note'],
  ['LG121', 'governing-chain-missed', 'missed-chain', 'error'],
  ['LG122', 'chain-cannot-form', 'phantom-chain', 'warning'],
  ['LG123', 'chain-does-not-exist', 'phantom-chain', 'error'],
  ['LG124', 'chain-width-mismatch', 'chain-width', 'error'],
  ['LG125', 'controlling-chain-differs', 'missed-chain', 'warning'],
  ['LG131', 'equal-share-below-full-load', 'equal-share', 'warning'],
  ['LG132', 'block-shear-governs', 'overstated', 'warning'],
  ['LG141', 'tabulated-gross-area-differs', 'input', 'note'],
  ['LG142', 'shear-lag-case-not-applicable', 'input', 'warning'],
  ['LG201', 'spacing-below-minimum', 'detailing', 'warning'],
  ['LG202', 'edge-distance-below-minimum', 'detailing', 'warning'],
  ['LG203', 'fracture-line-grazes-hole', 'detailing', 'warning'],
  ['LG204', 'en-spacing-below-minimum', 'detailing', 'warning'],
  ['LG205', 'en-spacing-above-maximum', 'detailing', 'warning'],
  ['LG206', 'csa-pitch-below-minimum', 'detailing', 'warning'],
  ['LG301', 'hole-outside-member', 'input', 'error'],
  ['LG302', 'holes-overlap', 'input', 'error'],
  ['LG303', 'duplicate-hole-id', 'input', 'error'],
  ['LG304', 'hole-outside-element', 'input', 'error'],
];

describe('FINDING_CATALOGUE', () => {
  it('holds exactly the fixed codes with their names, classes and default severities, in order', () => {
    expect(FINDING_CATALOGUE.map((r) => [r.code, r.name, r.class, r.severity])).toEqual(FIXED);
  });

  it('gives every code a title and a help text of two or three sentences', () => {
    for (const rule of FINDING_CATALOGUE) {
      expect(rule.title.length).toBeGreaterThan(10);
      const sentences = rule.help.split(/(?<=[.;])\s+(?=[A-Z])/).length;
      expect(sentences, rule.code).toBeGreaterThanOrEqual(2);
      expect(sentences, rule.code).toBeLessThanOrEqual(3);
    }
  });
});
