import { describe, expect, it } from 'vitest';
import { calcReaders } from './calcReaders.js';
import { normaliseMember } from './normaliseMember.js';

describe('normaliseMember', () => {
  it('a splice plate: lengths, holes, load and claims read into the engine’s member', () => {
    const read = calcReaders('in');
    const m = normaliseMember(
      {
        id: 'SP-1',
        kind: 'splice-plate',
        description: 'north splice',
        width: 14,
        thickness: '1/2',
        material: { grade: 'A36', Fy: 36, Fu: 58 },
        load: { directions: ['-x', '+x'], required: 150 },
        holes: [{ id: 'A', x: 0, y: 2, bolt: '3/4' }],
        claims: { An: 5.75 },
      },
      2,
      read,
    );
    expect(m).toEqual({
      index: 2,
      description: 'north splice',
      input: {
        id: 'SP-1',
        kind: 'splice-plate',
        width: 14,
        thickness: 0.5,
        material: { grade: 'A36', Fy: 36, Fu: 58 },
        holes: [{ id: 'A', x: 0, y: 2, type: 'standard', boltDiameter: 0.75 }],
        directions: ['-x', '+x'],
        requiredStrength: 150,
      },
      claims: { An: 5.75 },
    });
    expect(read.issues).toEqual([]);
  });

  it('an angle: width and thickness from the unfolded section (a + b − t, t), holes at their unfolded y', () => {
    const m = normaliseMember(
      {
        id: 'B',
        kind: 'angle',
        material: { Fy: 36, Fu: 58 },
        load: { directions: ['-x'], shearLag: { connected: 'leg', length: 9, xbar: 1.13 } },
        section: { shape: 'angle', a: 4, b: 4, t: 0.5 },
        holes: [{ id: 'A', x: 0, element: 'leg-a', gauge: 2.5, bolt: '3/4' }],
        blockShear: { endDistance: 1.5 },
      },
      0,
      calcReaders('in'),
    );
    expect(m.input.width).toBeCloseTo(7.5, 12);
    expect(m.input.thickness).toBe(0.5);
    expect(m.input.holes[0]!.y).toBeCloseTo(1.5, 12);
    expect(m.input.shearLag).toEqual({ connected: 'leg', length: 9, xbar: 1.13 });
    expect(m.input.blockShear).toEqual({ endDistance: 1.5 });
  });
});
