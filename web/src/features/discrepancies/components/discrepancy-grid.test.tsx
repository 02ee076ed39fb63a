import { fireEvent, screen, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import { DiscrepancyGrid, type DiscrepancyGridProps } from './discrepancy-grid';
import { discrepancyRow } from './discrepancy-rows.fixtures';

const rows = [
  discrepancyRow({ id: 11, code: 'LG101' }),
  discrepancyRow({
    id: 12,
    code: 'LG102',
    assignee: { id: 2, name: 'Priya Halvorsen' },
    dueDate: '2026-12-18',
  }),
  discrepancyRow({ id: 13, code: 'LG121', status: 'resolved', current: false, supersededBySubmittalId: 5 }),
];

function grid(over: Partial<DiscrepancyGridProps> = {}) {
  const props: DiscrepancyGridProps = {
    items: rows,
    sort: 'severity',
    order: 'asc',
    onSort: vi.fn(),
    selectable: true,
    selected: new Set(),
    onSelect: vi.fn(),
    activeId: null,
    onOpen: vi.fn(),
    submittalTitles: new Map([[3, 'Issue C — hangers, chord splice, mast gusset']]),
    ...over,
  };
  renderWithProviders(<DiscrepancyGrid {...props} />);
  return props;
}

describe('DiscrepancyGrid', () => {
  it('opens the row Enter is pressed on: the row, a cell or its selection box', () => {
    const { onOpen } = grid();
    const [, second, third] = screen.getAllByTestId('discrepancy-row');
    fireEvent.keyDown(second!, { key: 'Enter' });
    expect(onOpen).toHaveBeenLastCalledWith(12);
    fireEvent.keyDown(within(third!).getAllByRole('gridcell').at(-1)!, { key: 'Enter' });
    expect(onOpen).toHaveBeenLastCalledWith(13);
    fireEvent.keyDown(within(second!).getByRole('checkbox'), { key: 'Enter' });
    expect(onOpen).toHaveBeenCalledTimes(3);
  });

  it('leaves Enter on a button to the button, and other keys alone', () => {
    const { onOpen } = grid();
    const [first] = screen.getAllByTestId('discrepancy-row');
    fireEvent.keyDown(within(first!).getByRole('button', { name: /Open LG101/ }), { key: 'Enter' });
    fireEvent.keyDown(first!, { key: 'ArrowDown' });
    expect(onOpen).not.toHaveBeenCalled();
  });

  it('shows the submittal, who has it and by when, and which revision took it over', () => {
    grid();
    const [first, second, third] = screen.getAllByTestId('discrepancy-row');
    expect(within(first!).getByText('#3')).toHaveAttribute(
      'title',
      'Issue C — hangers, chord splice, mast gusset',
    );
    expect(within(second!).getByText('→ Priya Halvorsen · due 2026-12-18')).toBeInTheDocument();
    expect(within(third!).getByText('Resolved')).toBeInTheDocument();
    expect(within(third!).getByText('by #5')).toBeInTheDocument();
  });
});
