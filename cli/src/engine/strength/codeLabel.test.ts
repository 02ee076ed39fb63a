import { describe, expect, it } from 'vitest';
import { codeLabel } from './codeLabel.js';
import { designMethodOf } from './designMethodOf.js';

// Issue 10.11: EN 1993 and CSA S16 are not LRFD codes. Factors: EN 1993-1-1 6.1 recommended
// γM0 = 1.00, γM2 = 1.25 (conformance/SOURCES.md, Tables); CSA S16 φ = 0.90, φu = 0.75 (R3).
describe('designMethodOf names each code’s own design method', () => {
  it('AISC 360: LRFD or ASD as written', () => {
    expect(designMethodOf({ standard: 'AISC 360-22', method: 'LRFD' })).toBe('LRFD');
    expect(designMethodOf({ standard: 'AISC 360-16', method: 'ASD' })).toBe('ASD');
  });

  it('EN 1993-1-1: the partial factor method, also for a 1.0 file that says LRFD', () => {
    expect(designMethodOf({ standard: 'EN 1993-1-1', method: 'partial-factor' })).toBe('partial-factor');
    expect(designMethodOf({ standard: 'EN 1993-1-1', method: 'LRFD' })).toBe('partial-factor');
  });

  it('CSA S16: limit states design, also for a 1.0 file that says LRFD', () => {
    expect(designMethodOf({ standard: 'CSA S16-19', method: 'LSD' })).toBe('LSD');
    expect(designMethodOf({ standard: 'CSA S16-19', method: 'LRFD' })).toBe('LSD');
  });
});

describe('codeLabel', () => {
  it('AISC 360: the edition and LRFD or ASD', () => {
    expect(codeLabel({ standard: 'AISC 360-22', method: 'LRFD', units: 'in' })).toBe('AISC 360-22 LRFD');
    expect(codeLabel({ standard: 'AISC 360-16', method: 'ASD', units: 'in' })).toBe('AISC 360-16 ASD');
  });

  it('EN 1993-1-1: partial factors, recommended or a National Annex’s', () => {
    expect(codeLabel({ standard: 'EN 1993-1-1', method: 'LRFD', units: 'mm' })).toBe(
      'EN 1993-1-1, partial factors γM0 1.00, γM2 1.25',
    );
    expect(
      codeLabel({
        standard: 'EN 1993-1-1',
        method: 'partial-factor',
        units: 'mm',
        nationalAnnex: { gammaM2: 1.1 },
      }),
    ).toBe('EN 1993-1-1, partial factors γM0 1.00, γM2 1.10');
  });

  it('CSA S16: limit states design with its resistance factors', () => {
    expect(codeLabel({ standard: 'CSA S16-19', method: 'LSD', units: 'mm' })).toBe(
      'CSA S16-19, limit states design φ 0.90, φu 0.75',
    );
    expect(codeLabel({ standard: 'CSA S16-19', method: 'LRFD', units: 'mm' })).not.toContain('LRFD');
  });
});
