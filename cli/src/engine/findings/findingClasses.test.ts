import { describe, expect, it } from 'vitest';
import { FINDING_CATALOGUE } from './findingCatalogue.js';
import { FINDING_CLASSES, SEVERITIES } from './findingClasses.js';

describe('FINDING_CLASSES and SEVERITIES', () => {
  it('list the classes in the reading order of cli/docs/method.md §8 and the FindingClass type', () => {
    expect(FINDING_CLASSES).toEqual([
      'overstated',
      'understated',
      'missed-chain',
      'phantom-chain',
      'chain-width',
      'equal-share',
      'detailing',
      'input',
    ]);
    expect(SEVERITIES).toEqual(['error', 'warning', 'note']);
  });

  it('hold every class and severity the catalogue uses, and no other', () => {
    expect(new Set(FINDING_CATALOGUE.map((r) => r.class))).toEqual(new Set(FINDING_CLASSES));
    for (const rule of FINDING_CATALOGUE) expect(SEVERITIES).toContain(rule.severity);
  });
});
