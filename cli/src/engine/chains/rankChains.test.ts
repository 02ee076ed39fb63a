import { describe, expect, it } from 'vitest';
import { rankChains } from './rankChains.js';
import { d9 } from './layouts.fixtures.js';

describe('rankChains', () => {
  it('ranks all chains and says in which directions each can form and what blocks it otherwise', () => {
    const ranked = rankChains(d9, ['-x', '+x'], 3);
    expect(ranked.map((c) => [c.holes.join('-'), c.admissible])).toEqual([
      ['A-B-C-D', ['-x', '+x']],
      ['A-B-C', ['+x']],
      ['B-C-D', ['+x']],
    ]);
    expect(ranked[1]!.rejections).toEqual([{ direction: '-x', blockingHole: 'D', reason: 'loaded-side' }]);
    expect(ranked[2]!.rejections).toEqual([{ direction: '-x', blockingHole: 'A', reason: 'loaded-side' }]);
  });

  it('judges only the directions asked for', () => {
    expect(
      rankChains(d9, ['+x'], 15)
        .filter((c) => c.admissible.length === 0)
        .map((c) => c.holes.join('-')),
    ).toContain('A-D');
  });

  it('gives nothing without holes', () => {
    expect(rankChains({ width: 14, thickness: 0.5, holes: [] }, ['-x'])).toEqual([]);
  });
});
