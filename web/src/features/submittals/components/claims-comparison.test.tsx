import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import { ClaimsComparison, type Recomputed } from './claims-comparison';

// AISC Design Examples v13.0, Example D.9 (conformance/SOURCES.md R1): An recomputed 14 − 4 · 0.875 +
// 2 · 2.5²/12 = 11.5417 in × 0.5 = 5.7708 in²; published 5.75 in². Yielding 0.90 · 36 · 7 = 226.8 kip.
const d9: Recomputed = {
  Ag: 7,
  An: 5.770833,
  U: 1,
  Ae: 5.770833,
  yielding: 226.8,
  rupture: 251.03,
  available: 226.8,
  controllingChain: ['A', 'B', 'C', 'D'],
};

const row = (name: RegExp) =>
  within(screen.getByRole('table', { name: 'Claimed against recomputed' })).getByRole('row', { name });

describe('ClaimsComparison', () => {
  it('takes the published An 5.75 in² (0.36 % below) as agreeing at the default 0.5 %', () => {
    renderWithProviders(<ClaimsComparison claims={{ An: 5.75, Ag: 7 }} recomputed={d9} units="in" />);
    expect(row(/Net area An/)).toHaveTextContent('agrees');
    expect(row(/Gross area Ag/)).toHaveTextContent('agrees');
    expect(row(/Tensile yielding/)).toHaveTextContent('not claimed');
  });

  it('marks 5.80 in² (0.51 % above) overstated and 5.74 in² (0.53 % below) understated', () => {
    const { unmount } = renderWithProviders(
      <ClaimsComparison claims={{ An: 5.8 }} recomputed={d9} units="in" />,
    );
    expect(row(/Net area An/)).toHaveTextContent('overstated by 0.5 %');
    unmount();
    renderWithProviders(<ClaimsComparison claims={{ An: 5.74 }} recomputed={d9} units="in" />);
    expect(row(/Net area An/)).toHaveTextContent('understated by 0.5 %');
  });

  it('compares with the tolerance it is given: 5.80 in² agrees at 1 %', () => {
    renderWithProviders(
      <ClaimsComparison claims={{ An: 5.8 }} recomputed={d9} units="in" tolerance={0.01} />,
    );
    expect(row(/Net area An/)).toHaveTextContent('agrees');
    expect(
      screen.getByText(/Values within 1\.0 % of the recomputation are taken to agree/),
    ).toBeInTheDocument();
  });
});
