import { describe, expect, it } from 'vitest';
import { tensionProfileOf } from './tensionProfileOf.js';

describe('tensionProfileOf', () => {
  it('is null for AISC 360 (its rules are the core’s)', () => {
    expect(tensionProfileOf({ standard: 'AISC 360-16', method: 'ASD', units: 'in' })).toBeNull();
  });

  it('gives EN 1993-1-1 with the recommended γM0 = 1.00, γM2 = 1.25, or a National Annex’s', () => {
    const p = { standard: 'EN 1993-1-1', method: 'LRFD', units: 'mm' } as const;
    expect(tensionProfileOf(p)?.factors).toEqual({ gammaM0: 1, gammaM2: 1.25 });
    expect(tensionProfileOf({ ...p, nationalAnnex: { gammaM2: 1.1 } })?.factors).toEqual({
      gammaM0: 1,
      gammaM2: 1.1,
    });
  });

  it('gives CSA S16-19 with φ 0.90 and φu 0.75 (conformance/SOURCES.md R3)', () => {
    const p = tensionProfileOf({ standard: 'CSA S16-19', method: 'LRFD', units: 'mm' })!;
    expect(p.standard).toBe('CSA S16-19');
    // Holtz T10 main plate: Tr = 0.9 · 7500 · 350 = 2362 kN gross (published, rounded down from 2362.5).
    expect(p.tensionResistance({ Ag: 7500, An: 5700, Fy: 350, Fu: 450 }).yielding.available).toBeCloseTo(
      2362.5,
      9,
    );
  });
});
