import { describe, expect, it } from 'vitest';
import type { CodeProfile, HoleInput } from '../types.js';
import { edgeMinimum } from './edgeMinimum.js';

const AISC: CodeProfile = { standard: 'AISC 360-22', method: 'LRFD', units: 'in' };
const hole = (over: Partial<HoleInput> = {}): HoleInput => ({
  id: 'A',
  x: 0,
  y: 1,
  boltDiameter: 0.75,
  type: 'standard',
  ...over,
});

describe('edgeMinimum', () => {
  it('AISC 360 Table J3.4: 1 in for a 3/4 in bolt in a standard hole (published, AISC 360-16)', () => {
    expect(edgeMinimum(hole(), AISC, 1)).toEqual({ minimum: 1, text: '1.000 in of AISC 360 Table J3.4' });
  });

  it('adds Table J3.5’s C2 for an oversized hole: 1 + 1/16 in (from memory)', () => {
    const m = edgeMinimum(hole({ type: 'oversized' }), AISC, 1)!;
    expect(m.minimum).toBeCloseTo(1.0625, 12);
    expect(m.text).toContain('+ C2 0.063 in for an oversized hole (Table J3.5)');
  });

  it('under AISC 360-10 holds the rolled-edge column and names the sheared-edge value when closer than it', () => {
    const m = edgeMinimum(hole(), { ...AISC, standard: 'AISC 360-10' }, 1)!;
    expect(m.minimum).toBe(1);
    expect(m.text).toContain('at a sheared edge AISC 360-10 asks 1.250 in (from memory)');
  });

  it('nothing for a hole given only by its dimension', () => {
    expect(edgeMinimum(hole({ boltDiameter: undefined }), AISC, 1)).toBeUndefined();
  });
});
