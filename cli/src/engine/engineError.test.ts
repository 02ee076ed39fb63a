import { describe, expect, it } from 'vitest';
import { EngineError } from './engineError.js';

describe('EngineError', () => {
  it('is an Error named EngineError with a code and a module-prefixed message', () => {
    const e = new EngineError('unknown-bolt-size', 'no hole for a 0.8 in bolt');
    expect(e).toBeInstanceOf(Error);
    expect(e.name).toBe('EngineError');
    expect(e.code).toBe('unknown-bolt-size');
    expect(e.message).toBe('ligament/engine: no hole for a 0.8 in bolt');
  });
});
