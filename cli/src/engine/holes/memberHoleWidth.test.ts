import { describe, expect, it } from 'vitest';
import { EngineError } from '../engineError.js';
import { memberHoleWidth } from './memberHoleWidth.js';
import type { CodeProfile, HoleInput } from '../types.js';

const hole = (extra: Partial<HoleInput>): HoleInput => ({ id: 'H', x: 0, y: 50, type: 'standard', ...extra });
const p = (standard: CodeProfile['standard']): CodeProfile => ({ standard, method: 'LRFD', units: 'mm' });

describe('memberHoleWidth', () => {
  it('AISC 360: Table J3.3M standard hole + 2 mm (M20: 22 + 2 = 24 mm, conformance/SOURCES.md, Tables)', () => {
    expect(memberHoleWidth(hole({ boltDiameter: 20 }), p('AISC 360-22')).deducted).toBe(24);
  });

  it('EN 1993-1-1: d0 itself, no allowance (M20 normal clearance 22 mm, EN 1090-2)', () => {
    expect(memberHoleWidth(hole({ boltDiameter: 20 }), p('EN 1993-1-1'))).toMatchObject({
      nominalAcross: 22,
      allowance: 0,
      deducted: 22,
      source: 'table',
    });
  });

  it('CSA S16: an explicit 22 mm punched hole + 2 mm = 24 mm (Holtz T10, conformance/SOURCES.md R3)', () => {
    expect(memberHoleWidth(hole({ dimension: { across: 22, along: 22 } }), p('CSA S16-19'))).toMatchObject({
      nominalAcross: 22,
      allowance: 2,
      deducted: 24,
      source: 'explicit',
    });
  });

  it('refuses a slotted hole without an explicit size under EN or CSA', () => {
    expect(() =>
      memberHoleWidth(hole({ boltDiameter: 20, type: 'short-slotted', slot: 'along' }), p('EN 1993-1-1')),
    ).toThrow(EngineError);
  });
});
