import { describe, expect, it } from 'vitest';
import * as engine from './index.js';

describe('engine index', () => {
  it('exports exactly the documented public surface (cli/README.md, Library), nothing internal', () => {
    expect(Object.keys(engine).sort()).toEqual(
      [
        // Holes
        'holeTableInch',
        'holeTableMetric',
        'holeWidth',
        'memberHoleWidth',
        'minimumEdgeDistance',
        'inspectLayout',
        // The member model
        'memberModel',
        'memberLayout',
        // Chains
        'staggerTerm',
        'netWidth',
        'chainOf',
        'chainRejection',
        'fractureSides',
        'enumerateChains',
        'leastChains',
        'rankChains',
        'equalShareChain',
        // Rolled shapes
        'angle',
        'tee',
        'wShape',
        'channel',
        'plateSection',
        'unfold',
        'analyseSection',
        'SectionError',
        // Analysis
        'analyseModel',
        'analyseMember',
        'designMethodOf',
        'codeLabel',
        // The audit
        'auditMember',
        'auditCalc',
        'FINDING_CATALOGUE',
        'FINDING_CLASSES',
        'SEVERITIES',
        'findingRule',
        'withinTolerance',
        'DEFAULT_TOLERANCE',
        'formatQuantity',
        'unitSymbol',
        'quantityText',
        'findingQuantity',
        'formatDirection',
        'CAUTION',
        'EngineError',
        'ENGINE_VERSION',
      ].sort(),
    );
  });
});
