import { describe, expect, it } from 'vitest';
import type { SemanticIssue } from './normaliseTypes.js';
import { normaliseProfile } from './normaliseProfile.js';

describe('normaliseProfile', () => {
  it('EN 1993-1-1 with a National Annex’s partial factors', () => {
    const issues: SemanticIssue[] = [];
    expect(
      normaliseProfile(
        { standard: 'EN 1993-1-1', method: 'LRFD', nationalAnnex: { gammaM2: 1.1 } },
        'mm',
        issues,
      ),
    ).toEqual({
      standard: 'EN 1993-1-1',
      method: 'LRFD',
      units: 'mm',
      nationalAnnex: { gammaM2: 1.1 },
    });
    expect(issues).toEqual([]);
  });

  it('code-units and code-method for an EN or CSA file in inches or ASD; national-annex-standard outside EN', () => {
    const issues: SemanticIssue[] = [];
    normaliseProfile({ standard: 'CSA S16-19', method: 'ASD' }, 'in', issues);
    normaliseProfile(
      { standard: 'AISC 360-22', method: 'LRFD', nationalAnnex: { gammaM0: 1 } },
      'in',
      issues,
    );
    expect(issues.map((i) => [i.pointer, i.rule])).toEqual([
      ['/code/standard', 'code-units'],
      ['/code/method', 'code-method'],
      ['/code/nationalAnnex', 'national-annex-standard'],
    ]);
  });
});
