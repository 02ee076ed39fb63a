import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import { BulkMoveBar } from './bulk-move-bar';
import { discrepancyRow } from './discrepancy-rows.fixtures';

const answered = discrepancyRow({ id: 1, status: 'answered' });
const raised = discrepancyRow({ id: 2, status: 'raised', code: 'LG102' });
const resolved = discrepancyRow({ id: 3, status: 'resolved', current: false, supersededBySubmittalId: 5 });

describe('BulkMoveBar', () => {
  it('offers a move only when every selected row allows it, and says which rows stand in the way', () => {
    renderWithProviders(
      <BulkMoveBar projectId={1} selected={[answered, raised]} onDone={vi.fn()} onNarrow={vi.fn()} />,
    );
    expect(screen.getByRole('button', { name: 'Accept 2' })).toBeDisabled();
    expect(screen.getByRole('button', { name: 'Return 2' })).toBeDisabled();
    expect(screen.getByRole('button', { name: 'Waive 2' })).toBeEnabled();
    expect(screen.getByText('Accept: 1 of 2 selected is not answered.')).toBeInTheDocument();
    expect(screen.queryByText(/^Waive:/)).not.toBeInTheDocument();
  });

  it('keeps only the rows a move allows, on request', async () => {
    const onNarrow = vi.fn();
    renderWithProviders(
      <BulkMoveBar projectId={1} selected={[answered, raised]} onDone={vi.fn()} onNarrow={onNarrow} />,
    );
    await userEvent.click(screen.getAllByRole('button', { name: 'Keep the 1 that can be moved' })[0]!);
    expect(onNarrow).toHaveBeenCalledWith(new Set([1]));
  });

  it('offers nothing for an item a later revision took over', () => {
    renderWithProviders(
      <BulkMoveBar projectId={1} selected={[resolved]} onDone={vi.fn()} onNarrow={vi.fn()} />,
    );
    for (const name of ['Accept 1', 'Return 1', 'Waive 1'])
      expect(screen.getByRole('button', { name })).toBeDisabled();
    expect(
      screen.getByText(
        /Waive: 1 of 1 selected is not raised, answered or returned \(or a later revision took them over\)\./,
      ),
    ).toBeInTheDocument();
  });
});
