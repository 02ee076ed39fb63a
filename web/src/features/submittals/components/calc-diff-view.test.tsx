import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import { CalcDiffView } from './calc-diff-view';

const patch = [
  '--- a/sp.json',
  '+++ b/sp.json',
  '@@ -3,3 +3,3 @@',
  '   "Ag": 5,',
  '-  "An": 4.125,',
  '+  "An": 3.912,',
  '+  "Ae": 3.912,',
  '',
].join('\n');

describe('CalcDiffView', () => {
  it('counts added and removed lines, ignoring the file headers', () => {
    renderWithProviders(<CalcDiffView patch={patch} label="Changes in sp.json" />);
    expect(screen.getByText('2 lines added, 1 removed')).toBeInTheDocument();
  });

  it('keeps the + and − signs in the text so colour is not the only cue', () => {
    renderWithProviders(<CalcDiffView patch={patch} label="Changes in sp.json" />);
    const region = screen.getByRole('region', { name: 'Changes in sp.json' });
    expect(region.textContent).toContain('-  "An": 4.125,');
    expect(region.textContent).toContain('+  "An": 3.912,');
  });
});
