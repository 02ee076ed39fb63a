import { describe, expect, it } from 'vitest';
import { EngineError } from '../engineError.js';
import { findingRule } from './findingRule.js';

describe('findingRule', () => {
  it('looks a code up in the catalogue', () => {
    expect(findingRule('LG121')).toMatchObject({ name: 'governing-chain-missed', class: 'missed-chain' });
  });

  it('throws for an unknown code', () => {
    expect(() => findingRule('LG999')).toThrow(EngineError);
  });
});
