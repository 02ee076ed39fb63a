import { describe, expect, it } from 'vitest';
import { calcReaders } from './calcReaders.js';
import { normaliseClaims } from './normaliseClaims.js';

describe('normaliseClaims', () => {
  it('reads claimed net widths as lengths and keeps the claimed numbers as given', () => {
    const read = calcReaders('in');
    expect(
      normaliseClaims(
        {
          chains: [
            { holes: ['A', 'D'], netWidth: '12-1/4', direction: '-x' },
            { holes: ['A', 'B', 'C', 'D'] },
          ],
          controllingChain: { holes: ['A', 'B', 'C', 'D'] },
          An: 5.75,
          available: 226.8,
        },
        '/members/0/claims',
        read,
      ),
    ).toEqual({
      chains: [{ holes: ['A', 'D'], netWidth: 12.25, direction: '-x' }, { holes: ['A', 'B', 'C', 'D'] }],
      controllingChain: { holes: ['A', 'B', 'C', 'D'] },
      An: 5.75,
      available: 226.8,
    });
    expect(read.issues).toEqual([]);
  });

  it('a bad claimed net width is reported at its chain', () => {
    const read = calcReaders('mm');
    normaliseClaims(
      { chains: [{ holes: ['A'] }, { holes: ['B'], netWidth: '228' }] },
      '/members/0/claims',
      read,
    );
    expect(read.issues.map((i) => i.pointer)).toEqual(['/members/0/claims/chains/1/netWidth']);
  });
});
