import { describe, expect, it } from 'vitest';
import { EngineError } from '../engineError.js';
import { holeWidth } from './holeWidth.js';
import type { CodeProfile, HoleInput } from '../types.js';

const IN22: CodeProfile = { standard: 'AISC 360-22', method: 'LRFD', units: 'in' };
const IN10: CodeProfile = { standard: 'AISC 360-10', method: 'LRFD', units: 'in' };
const MM: CodeProfile = { standard: 'AISC 360-16', method: 'LRFD', units: 'mm' };
const hole = (over: Partial<HoleInput>): HoleInput => ({ id: 'H1', x: 0, y: 2, type: 'standard', ...over });

describe('holeWidth', () => {
  it('deducts the standard hole plus 1/16 in: 0.875 in for a 3/4 in bolt (published: AISC Design Examples v13.0 D.9)', () => {
    expect(holeWidth(hole({ boltDiameter: 0.75 }), IN22)).toEqual({
      holeId: 'H1',
      nominalAcross: 13 / 16,
      nominalAlong: 13 / 16,
      allowance: 1 / 16,
      deducted: 0.875,
      source: 'table',
    });
  });

  it('deducts 1.3125 in for a 1-1/8 in bolt under AISC 360-16 (published: AISC 360-16 teaching calc, W12x72)', () => {
    expect(holeWidth(hole({ boltDiameter: 1.125 }), { ...IN22, standard: 'AISC 360-16' }).deducted).toBe(
      1.3125,
    );
  });

  it('deducts 1-1/8 + 1/16 for a 1 in bolt from 2016, 1-1/16 + 1/16 under 2010', () => {
    expect(holeWidth(hole({ boltDiameter: 1 }), IN22).deducted).toBe(1.1875);
    expect(holeWidth(hole({ boltDiameter: 1 }), IN10).deducted).toBe(1.125);
  });

  it('deducts the oversized hole plus the allowance', () => {
    expect(holeWidth(hole({ boltDiameter: 0.75, type: 'oversized' }), IN22).deducted).toBe(1);
  });

  it('deducts a slot running along the load by its short dimension, one across by its long dimension', () => {
    const along = holeWidth(hole({ boltDiameter: 0.75, type: 'short-slotted', slot: 'along' }), IN22);
    expect(along).toMatchObject({ nominalAcross: 13 / 16, nominalAlong: 1, deducted: 0.875 });
    const across = holeWidth(hole({ boltDiameter: 0.75, type: 'long-slotted', slot: 'across' }), IN22);
    expect(across).toMatchObject({ nominalAcross: 1 + 7 / 8, nominalAlong: 13 / 16, deducted: 1.9375 });
  });

  it('adds 2 mm in mm: M20 standard 22 + 2 = 24 mm; M24 long slot across 60 + 2 (Table J3.3M, published)', () => {
    expect(holeWidth(hole({ boltDiameter: 20 }), MM).deducted).toBe(24);
    expect(holeWidth(hole({ boltDiameter: 24, type: 'long-slotted', slot: 'across' }), MM).deducted).toBe(62);
  });

  it('adds the allowance to an explicit dimension too (Holtz T10: 22 mm hole → 24 mm)', () => {
    expect(holeWidth(hole({ dimension: { across: 22, along: 22 } }), MM)).toMatchObject({
      deducted: 24,
      source: 'explicit',
    });
  });

  it('throws an EngineError naming a bolt size the table does not have', () => {
    expect(() => holeWidth(hole({ boltDiameter: 0.8 }), IN22)).toThrow(EngineError);
    expect(() => holeWidth(hole({ boltDiameter: 0.8 }), IN22)).toThrow(/0\.8 in bolt/);
    expect(() => holeWidth(hole({ boltDiameter: 33 }), MM)).toThrow(/M33/);
  });

  it('throws for a slot without orientation and for a hole without bolt or dimension', () => {
    expect(() => holeWidth(hole({ boltDiameter: 0.75, type: 'short-slotted' }), IN22)).toThrow(/slot/);
    expect(() => holeWidth(hole({}), IN22)).toThrow(/neither a bolt diameter nor a dimension/);
  });
});
