import { describe, expect, it } from 'vitest';
import { fractureSides } from './fractureSides.js';
import type { HoleLayout } from '../types.js';
import { d9 } from './layouts.fixtures.js';

describe('fractureSides', () => {
  it('puts the holes beyond the straight D.9 chain A–D on the far side for -x and the loaded side for +x', () => {
    expect(fractureSides({ holes: ['A', 'D'] }, d9, '-x')).toEqual({
      direction: '-x',
      chain: ['A', 'D'],
      loaded: [],
      onLine: [],
      far: ['B', 'C'],
    });
    expect(fractureSides({ holes: ['A', 'D'] }, d9, '+x').loaded).toEqual(['B', 'C']);
  });

  it('reports collinear holes not in the chain as on the line', () => {
    const row: HoleLayout = {
      width: 12,
      thickness: 0.5,
      holes: [
        { id: 'P', index: 0, x: 0, y: 3, deducted: 0.875 },
        { id: 'Q', index: 1, x: 1, y: 6, deducted: 0.875 },
        { id: 'R', index: 2, x: 2, y: 9, deducted: 0.875 },
      ],
    };
    expect(fractureSides({ holes: ['P', 'R'] }, row, '-x').onLine).toEqual(['Q']);
  });
});
