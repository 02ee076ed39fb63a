import { describe, expect, it } from 'vitest';
import * as engine from './index.js';

describe('engine index', () => {
  it('exports every name the team brief lists', () => {
    for (const name of [
      'holeWidth',
      'staggerTerm',
      'netWidth',
      'leastChains',
      'enumerateChains',
      'rankChains',
      'chainRejection',
      'equalShareChain',
      'analyseMember',
      'inspectLayout',
      'auditMember',
      'auditCalc',
      'FINDING_CATALOGUE',
      'ENGINE_VERSION',
      'EngineError',
      'memberLayout',
    ]) {
      expect(engine, name).toHaveProperty(name);
    }
  });
});
