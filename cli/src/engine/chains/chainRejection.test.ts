import { describe, expect, it } from 'vitest';
import { chainRejection } from './chainRejection.js';
import type { HoleLayout } from '../types.js';
import { d9 } from './layouts.fixtures.js';

describe('chainRejection', () => {
  it('accepts a chain through every hole in both directions', () => {
    expect(chainRejection({ holes: ['A', 'B', 'C', 'D'] }, d9, '-x')).toBeNull();
    expect(chainRejection({ holes: ['A', 'B', 'C', 'D'] }, d9, '+x')).toBeNull();
  });

  it('rejects the straight D.9 chain A–D under +x: B is on the loaded side', () => {
    expect(chainRejection({ holes: ['A', 'D'] }, d9, '-x')).toBeNull();
    expect(chainRejection({ holes: ['A', 'D'] }, d9, '+x')).toEqual({
      direction: '+x',
      blockingHole: 'B',
      reason: 'loaded-side',
    });
  });

  it('rejects A–B–C under -x: D is beyond the last hole on the loaded side', () => {
    expect(chainRejection({ holes: ['A', 'B', 'C'] }, d9, '-x')).toMatchObject({ blockingHole: 'D' });
  });

  it('rejects a chain with a hole exactly on its line as on-line, in both directions', () => {
    const row: HoleLayout = {
      width: 12,
      thickness: 0.5,
      holes: [
        { id: 'P', index: 0, x: 0, y: 3, deducted: 0.875 },
        { id: 'Q', index: 1, x: 1, y: 6, deducted: 0.875 },
        { id: 'R', index: 2, x: 2, y: 9, deducted: 0.875 },
      ],
    };
    expect(chainRejection({ holes: ['P', 'R'] }, row, '-x')).toEqual({
      direction: '-x',
      blockingHole: 'Q',
      reason: 'on-line',
    });
    expect(chainRejection({ holes: ['P', 'R'] }, row, '+x')?.reason).toBe('on-line');
  });

  it('rejects a hole on the same gauge line at smaller x for -x', () => {
    const pair: HoleLayout = {
      width: 10,
      thickness: 1,
      holes: [
        { id: 'A', index: 0, x: 0, y: 5, deducted: 1 },
        { id: 'B', index: 1, x: 3, y: 5, deducted: 1 },
      ],
    };
    expect(chainRejection({ holes: ['B'] }, pair, '-x')).toMatchObject({
      blockingHole: 'A',
      reason: 'loaded-side',
    });
    expect(chainRejection({ holes: ['A'] }, pair, '-x')).toBeNull();
  });
});
