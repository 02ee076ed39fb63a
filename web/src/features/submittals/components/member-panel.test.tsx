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

/** Renders the first member of a schema example (fictional Harbour Lantern files); `edit` changes the text first. */
function renderExample(name: string, edit: (text: string) => string = (t) => t) {
  const loaded = loadCalcText(
    edit(readFileSync(`${process.cwd()}/../schema/examples/${name}`, 'utf8')),
    name,
  );
  if (!loaded.ok) throw new Error(loaded.errors.map((e) => e.message).join('; '));
  const member = loaded.document.members[0]!;
  const result = analyseMember(member.input, loaded.document.profile, { k: 5 });
  renderWithProviders(
    <MemberPanel document={loaded.document} member={member} result={result} findings={[]} />,
  );
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
    renderExample('lantern-brace-angle.json');
    const block = screen.getByRole('row', { name: /^Block shear \(available\)/ });
    expect(within(block).getByText(/agrees/)).toBeTruthy();
    const governing = screen.getByRole('row', { name: /^Governing available strength, block shear/ });
    expect(within(governing).getByText(/agrees/)).toBeTruthy();
  });
});

describe('MemberPanel writes every number with its file’s unit and precision', () => {
  function panelFor(example: string) {
    renderExample(example);
    const claims = screen.getByRole('table', { name: 'Claimed against recomputed' });
    const cells = (label: RegExp) =>
      within(within(claims).getByRole('row', { name: label }))
        .getAllByRole('cell')
        .map((c) => c.textContent);
    return { cells };
  }

  // Hand arithmetic in the examples' meta.notes: D.9 layout, An = 11.542 × 0.5 = 5.771 in² (claimed 5.770),
  // yielding 0.90 × 36 × 7.00 = 226.8 kip; south hanger An = 186.727 × 16 = 2987.6 mm², claimed 3232.
  it('an inch file: in² and kip in each cell, in in the chain table headings', () => {
    const { cells } = panelFor('north-splice-correct.json');
    expect(cells(/^Net area An/).slice(1, 3)).toEqual(['5.770 in²', '5.771 in²']);
    expect(cells(/^Tensile yielding/).slice(1, 3)).toEqual(['226.8 kip', '226.8 kip']);
    expect(cells(/^Shear lag factor U/).slice(1, 3)).toEqual(['1.000', '1.000']);
    expect(screen.getAllByRole('columnheader', { name: 'Net width (in)' }).length).toBeGreaterThan(0);
    expect(
      screen.getAllByRole('row', { name: /^Chain A1 – B1 – C1 – D1, net width 11\.542 in/ }).length,
    ).toBe(2);
  });

  it('a mm file: mm² and kN in each cell, mm in the chain table headings', () => {
    const { cells } = panelFor('south-hanger-missed-chain.json');
    expect(cells(/^Net area An/).slice(1, 3)).toEqual(['3232 mm²', '2988 mm²']);
    expect(cells(/^Tensile rupture/).slice(1, 3)).toEqual(['1090.8 kN', '1008.3 kN']);
    expect(screen.getByRole('columnheader', { name: 'Net area (mm²)' })).toBeTruthy();
    const governing = screen.getByRole('row', {
      name: /^Chain H1 – H2 – H3 – H4, net width 186\.7 mm, governing/,
    });
    expect(
      within(governing)
        .getAllByRole('cell')
        .map((c) => c.textContent)
        .slice(-2),
    ).toEqual(['186.7', '2988']);
  });
});

describe('MemberPanel names the code by its own design method (issue 10.11)', () => {
  it('an EN 1993-1-1 file written to 1.0 with "LRFD" reads as partial factors, not LRFD', () => {
    renderExample('lantern-deck-en1993.json', (t) =>
      t.replace('"method": "partial-factor"', '"method": "LRFD"'),
    );
    expect(screen.getByText(/Checked to EN 1993-1-1, partial factors γM0 1\.00, γM2 1\.25\./)).toBeTruthy();
    expect(screen.getByTestId('member-drawing').textContent).toContain(
      'EN 1993-1-1, partial factors γM0 1.00, γM2 1.25',
    );
    expect(screen.getByTestId('member-drawing').textContent).not.toContain('LRFD');
  });
});
