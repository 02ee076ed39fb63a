import { describe, expect, it } from 'vitest';
import { FINDING_CATALOGUE } from './findingCatalogue.js';
import { findingQuantity } from './findingQuantity.js';

describe('findingQuantity', () => {
  it('names what the numbers of the claim codes measure', () => {
    expect(['LG101', 'LG102', 'LG103', 'LG104', 'LG105', 'LG106', 'LG107'].map(findingQuantity)).toEqual([
      'area',
      'area',
      'force',
      'ratio',
      'area',
      'force',
      'area',
    ]);
    expect(['LG121', 'LG122', 'LG124', 'LG125', 'LG131', 'LG132'].map(findingQuantity)).toEqual([
      'area',
      'length',
      'length',
      'length',
      'area',
      'force',
    ]);
  });

  it('gives understated codes the dimension of their overstated twins', () => {
    for (let n = 101; n <= 107; n += 1) {
      expect(findingQuantity(`LG${n + 10}`)).toBe(findingQuantity(`LG${n}`));
    }
  });

  it('has none for codes without numbers and for unknown codes', () => {
    expect(['LG123', 'LG301', 'LG302', 'LG303', 'LG304', 'LG999'].map(findingQuantity)).toEqual([
      null,
      null,
      null,
      null,
      null,
      null,
    ]);
  });

  it('knows only catalogue codes', () => {
    const codes = new Set(FINDING_CATALOGUE.map((r) => r.code));
    for (let n = 100; n < 400; n += 1) {
      if (findingQuantity(`LG${n}`) !== null) expect(codes.has(`LG${n}`), `LG${n}`).toBe(true);
    }
  });
});
