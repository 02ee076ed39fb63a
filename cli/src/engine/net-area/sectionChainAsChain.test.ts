import { describe, expect, it } from 'vitest';
import { sectionChainAsChain } from './sectionChainAsChain.js';

describe('sectionChainAsChain', () => {
  it('gives a section chain in plate widths at the member thickness, all pieces (2L6x6x5/8, one 0.9375 in hole)', () => {
    // Hand check: 0.9375 · 0.625 · 2 = 1.171875 in² deducted; net area 14.26 − 1.171875 = 13.088125 in².
    const chain = sectionChainAsChain(
      { holes: ['A'], legs: [], deductedArea: 1.171875, staggerArea: 0, netArea: 13.088125 },
      0.625,
      2,
    );
    expect(chain).toEqual({
      holes: ['A'],
      legs: [],
      deducted: 0.9375,
      staggerSum: 0,
      netWidth: 13.088125 / 1.25,
      netArea: 13.088125,
    });
  });

  it('sums the legs’ s²/4g as widths and keeps only the plate fields of each leg', () => {
    const leg = {
      from: 'A',
      to: 'B',
      s: 3,
      g: 3,
      term: 0.75,
      thickness: 0.415,
      area: 0.31125,
      junctions: [],
    };
    const chain = sectionChainAsChain(
      {
        holes: ['A', 'B'],
        legs: [leg, { ...leg, from: 'B', to: 'C' }],
        deductedArea: 1,
        staggerArea: 0.6225,
        netArea: 19.6,
      },
      0.415,
      1,
    );
    expect(chain.staggerSum).toBe(1.5);
    expect(chain.legs[0]).toEqual({ from: 'A', to: 'B', s: 3, g: 3, term: 0.75 });
  });
});
