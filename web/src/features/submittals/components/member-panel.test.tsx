import { fireEvent, screen, within } from '@testing-library/react';
import { readFileSync } from 'node:fs';
import { loadCalcText } from 'ligament/calc';
import { analyseMember } from 'ligament/engine';
import { describe, expect, it } from 'vitest';
import { readFixture } from '@/testing/fixtures';
import { renderWithProviders } from '@/testing/render';
import { MemberPanel } from './member-panel';

// The demo's splice plate (fictional): claims the straight chain A1–A2 while the zigzag A1–B1–A2 governs.
const text = readFixture('splice-plates.json');

function splicePlate() {
  const loaded = loadCalcText(text, 'splice-plates.json');
  if (!loaded.ok) throw new Error(loaded.errors.map((e) => e.message).join('; '));
  const member = loaded.document.members[0]!;
  const result = analyseMember(member.input, loaded.document.profile, { k: 5 });
  return { document: loaded.document, member, result };
}

describe('MemberPanel', () => {
  it('draws the plate with one outline per hole and the governing fracture line', () => {
    const { document, member, result } = splicePlate();
    renderWithProviders(<MemberPanel document={document} member={member} result={result} findings={[]} />);
    const drawing = screen.getByTestId('member-drawing');
    expect(drawing.querySelectorAll('[data-hole]')).toHaveLength(3);
    expect(drawing.querySelector('[data-fracture]')?.getAttribute('data-chain')).toBe('A1 B1 A2');
  });

  it('draws the claimed controlling chain beside the governing one, and the legend names both', () => {
    const { document, member, result } = splicePlate();
    renderWithProviders(<MemberPanel document={document} member={member} result={result} findings={[]} />);
    const drawing = screen.getByTestId('member-drawing');
    const claimed = drawing.querySelector('[data-claimed-chain]');
    expect(claimed?.getAttribute('data-claimed-chain')).toBe('A1 A2');
    expect(claimed?.querySelectorAll('polygon')).toHaveLength(2);
    expect(within(drawing as unknown as HTMLElement).getByText(/^claimed.*: A1–A2/)).toBeInTheDocument();
    const legend = screen.getByRole('list', { name: 'Lines on the drawing' });
    expect(within(legend).getByText(/Governing fracture line, load from −x/)).toBeInTheDocument();
    expect(within(legend).getByText(/Chain the calc file claims controls/)).toBeInTheDocument();
  });

  it('hovering a chain row traces that chain on the drawing, and leaving clears it', () => {
    const { document, member, result } = splicePlate();
    renderWithProviders(<MemberPanel document={document} member={member} result={result} findings={[]} />);
    const straight = screen.getByRole('row', { name: /^Chain A1 – A2,/ });
    fireEvent.mouseEnter(straight);
    const drawing = screen.getByTestId('member-drawing');
    expect(drawing.querySelector('[data-highlighted-chain]')?.getAttribute('data-highlighted-chain')).toBe(
      'A1 A2',
    );
    fireEvent.mouseLeave(straight);
    expect(drawing.querySelector('[data-highlighted-chain]')).toBeNull();
  });

  it('marks the overstated net area in words, not colour alone', () => {
    const { document, member, result } = splicePlate();
    renderWithProviders(<MemberPanel document={document} member={member} result={result} findings={[]} />);
    const table = screen.getByRole('table', { name: 'Claimed against recomputed' });
    const netRow = within(table).getByRole('row', { name: /Net area An/ });
    expect(netRow).toHaveTextContent(/overstated by \d+\.\d %/);
    expect(within(table).getByRole('row', { name: /Gross area Ag/ })).toHaveTextContent('agrees');
    expect(within(table).getByRole('row', { name: /Controlling chain/ })).toHaveTextContent('differs');
  });

  it('compares the block shear claim and names block shear as the governing limit state', () => {
    // The Harbour Lantern brace (fictional, schema/examples): block shear 81.1 kip governs, claimed so.
    const brace = readFileSync(`${process.cwd()}/../schema/examples/lantern-brace-angle.json`, 'utf8');
    const loaded = loadCalcText(brace, 'lantern-brace-angle.json');
    if (!loaded.ok) throw new Error(loaded.errors.map((e) => e.message).join('; '));
    const member = loaded.document.members[0]!;
    const result = analyseMember(member.input, loaded.document.profile, { k: 5 });
    renderWithProviders(
      <MemberPanel document={loaded.document} member={member} result={result} findings={[]} />,
    );
    const block = screen.getByRole('row', { name: /^Block shear \(available\)/ });
    expect(within(block).getByText(/agrees/)).toBeTruthy();
    const governing = screen.getByRole('row', { name: /^Governing available strength, block shear/ });
    expect(within(governing).getByText(/agrees/)).toBeTruthy();
  });
});
