import { describe, expect, it } from 'vitest';
import { calcReaders } from './calcReaders.js';
import { normaliseShearLag } from './normaliseShearLag.js';

describe('normaliseShearLag', () => {
  it('reads l and x̄ as lengths and keeps the rest', () => {
    expect(
      normaliseShearLag(
        { connected: 'leg', length: 9, xbar: '1-1/8', fastenersPerLine: 4 },
        '/members/0',
        calcReaders('in'),
      ),
    ).toEqual({ connected: 'leg', length: 9, xbar: 1.125, fastenersPerLine: 4 });
    expect(normaliseShearLag({ connected: 'flange' }, '/members/0', calcReaders('in'))).toEqual({
      connected: 'flange',
    });
  });

  it('a bad length is reported at load/shearLag', () => {
    const read = calcReaders('mm');
    normaliseShearLag({ connected: 'leg', xbar: '30' }, '/members/3', read);
    expect(read.issues.map((i) => i.pointer)).toEqual(['/members/3/load/shearLag/xbar']);
  });
});
