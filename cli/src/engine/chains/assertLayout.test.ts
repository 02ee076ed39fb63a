import { describe, expect, it } from 'vitest';
import { assertLayout } from './assertLayout.js';
import { EngineError } from '../engineError.js';

const hole = { id: 'A', index: 0, x: 0, y: 5, deducted: 0.875 };

describe('assertLayout', () => {
  it('accepts a plate with finite holes', () => {
    expect(() => assertLayout({ width: 10, thickness: 0.5, holes: [hole] }, 'leastChains')).not.toThrow();
  });

  it('names the caller and the bad value', () => {
    expect(() => assertLayout({ width: 0, thickness: 0.5, holes: [] }, 'leastChains')).toThrow(
      'ligament/engine: leastChains: width must be a positive number, got 0',
    );
    expect(() => assertLayout({ width: 10, thickness: Number.NaN, holes: [] }, 'equalShareChain')).toThrow(
      EngineError,
    );
    expect(() => assertLayout({ width: 10, thickness: 1, holes: [{ ...hole, y: Number.NaN }] }, 'x')).toThrow(
      /hole A/,
    );
    expect(() => assertLayout({ width: 10, thickness: 1, holes: [{ ...hole, deducted: -1 }] }, 'x')).toThrow(
      /deducts -1/,
    );
  });
});
