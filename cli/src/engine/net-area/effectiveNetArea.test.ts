import { describe, expect, it } from 'vitest';
import { EngineError } from '../engineError.js';
import { memberModel } from '../member/memberModel.js';
import type { CodeProfile, MemberInput } from '../types.js';
import { effectiveNetArea } from './effectiveNetArea.js';

const AISC: CodeProfile = { standard: 'AISC 360-16', method: 'LRFD', units: 'in' };
const CSA: CodeProfile = { standard: 'CSA S16-19', method: 'LRFD', units: 'mm' };

// The conformance vector aisc-j41-splice-plate-cap: PL 12 × 1/2, one 3/4 in bolt (0.875 in deducted).
// By hand: Ag 6.00 in², An 5.5625 in² > 0.85 Ag = 5.10 in².
const plate = (kind: MemberInput['kind']): MemberInput => ({
  id: 'SP',
  kind,
  width: 12,
  thickness: 0.5,
  material: { Fy: 36, Fu: 58 },
  directions: ['-x'],
  holes: [{ id: 'A', x: 0, y: 6, boltDiameter: 0.75, type: 'standard' }],
});

describe('effectiveNetArea', () => {
  it('caps a bolted splice plate at 0.85 Ag (AISC 360 J4.1(b)): Ae 5.10 in², U 1.0 with nothing to report', () => {
    expect(effectiveNetArea(memberModel(plate('splice-plate'), AISC), 5.5625, 6)).toEqual({
      U: 1,
      Ae: 0.85 * 6,
      capped: true,
    });
  });

  it('does not cap a gusset (J4.1(b) names splice plates only): Ae = An', () => {
    expect(effectiveNetArea(memberModel(plate('gusset'), AISC), 5.5625, 6)).toEqual({
      U: 1,
      Ae: 5.5625,
      capped: false,
    });
  });

  it('takes a given U and says so; the cap is AISC 360’s, not CSA S16’s', () => {
    const given = { ...plate('splice-plate'), U: 0.9 };
    expect(effectiveNetArea(memberModel(given, AISC), 5.5625, 6)).toMatchObject({
      U: 0.9,
      Ae: Math.min(0.9 * 5.5625, 5.1),
      shearLag: { rule: 'given' },
    });
    const metric: MemberInput = {
      ...plate('splice-plate'),
      width: 300,
      thickness: 12,
      holes: [{ id: 'A', x: 0, y: 150, boltDiameter: 20, type: 'standard' }],
    };
    // An 3312 mm² is above 0.85 · 3600 = 3060 mm², and CSA S16 has no such cap: Ae = An.
    expect(effectiveNetArea(memberModel(metric, CSA), 3312, 3600)).toEqual({ U: 1, Ae: 3312, capped: false });
  });

  it('refuses a net area U cannot multiply (rule net-area-positive)', () => {
    expect(() => effectiveNetArea(memberModel(plate('plate'), AISC), 0, 6)).toThrow(EngineError);
  });
});
