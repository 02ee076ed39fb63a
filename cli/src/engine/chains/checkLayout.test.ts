import { describe, expect, it } from 'vitest';
import { checkLayout } from './checkLayout.js';
import { EngineError } from '../engineError.js';

const hole = { id: 'A', index: 0, x: 0, y: 5, deducted: 0.875 };

describe('checkLayout', () => {
  it('accepts a plate with finite holes', () => {
    expect(() => checkLayout({ width: 10, thickness: 0.5, holes: [hole] }, 'leastChains')).not.toThrow();
  });

  it('names the caller and the bad value', () => {
    expect(() => checkLayout({ width: 0, thickness: 0.5, holes: [] }, 'leastChains')).toThrow(
      'ligament/engine: leastChains: width must be a positive number, got 0',
    );
    expect(() => checkLayout({ width: 10, thickness: Number.NaN, holes: [] }, 'shareCheck')).toThrow(
      EngineError,
    );
    expect(() => checkLayout({ width: 10, thickness: 1, holes: [{ ...hole, y: Number.NaN }] }, 'x')).toThrow(
      /hole A/,
    );
    expect(() => checkLayout({ width: 10, thickness: 1, holes: [{ ...hole, deducted: -1 }] }, 'x')).toThrow(
      /deducts -1/,
    );
  });
});
