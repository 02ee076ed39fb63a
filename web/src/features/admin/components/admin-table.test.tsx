import { Button } from '@fluentui/react-components';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { ApiError } from '@/lib/api-error';
import { renderWithProviders } from '@/testing/render';
import { AdminTable, type AdminColumn, type ListQuery } from './admin-table';

interface Person {
  readonly id: number;
  readonly name: string;
  readonly role: string;
}

const PEOPLE: readonly Person[] = [
  { id: 1, name: 'Tomasz Quell', role: 'checker' },
  { id: 2, name: 'Priya Halvorsen', role: 'consultant' },
];

const columns: AdminColumn<Person>[] = [
  { id: 'name', header: 'Name', cell: (p) => p.name },
  { id: 'role', header: 'Role', cell: (p) => p.role },
  {
    id: 'edit',
    header: 'Edit',
    hideHeader: true,
    cell: (p) => <Button aria-label={`Edit ${p.name}`}>Edit</Button>,
  },
];

function query(over: Partial<ListQuery<Person>>): ListQuery<Person> {
  return { isPending: false, isError: false, error: null, data: PEOPLE, refetch: vi.fn(), ...over };
}

describe('AdminTable', () => {
  it('says it is loading, with the panel’s own label, while the list is pending', () => {
    renderWithProviders(
      <AdminTable
        query={query({ isPending: true, data: undefined })}
        label="People"
        columns={columns}
        rowKey={(p) => p.id}
        loadingLabel="Loading people…"
      />,
    );
    expect(screen.getByRole('status')).toHaveTextContent('Loading people…');
    expect(screen.queryByRole('table')).not.toBeInTheDocument();
  });

  it('shows the API error and retries the query on “Try again”', async () => {
    const refetch = vi.fn();
    const error = new ApiError({ statusCode: 403, error: 'Forbidden', message: 'Admins only.' });
    renderWithProviders(
      <AdminTable
        query={query({ isError: true, error, data: undefined, refetch })}
        label="People"
        columns={columns}
        rowKey={(p) => p.id}
      />,
    );
    expect(screen.getByRole('alert')).toHaveTextContent('Admins only.');
    expect(screen.getByRole('alert')).not.toHaveTextContent(/403|Forbidden/);
    await userEvent.click(screen.getByRole('button', { name: 'Try again' }));
    expect(refetch).toHaveBeenCalledTimes(1);
  });

  it('shows the empty title instead of a table when the list is empty', () => {
    renderWithProviders(
      <AdminTable
        query={query({ data: [] })}
        label="People"
        columns={columns}
        rowKey={(p) => p.id}
        emptyTitle="Nobody yet"
      />,
    );
    expect(screen.getByText('Nobody yet')).toBeInTheDocument();
    expect(screen.queryByRole('table')).not.toBeInTheDocument();
  });

  it('keeps the headings of an empty list when it has no empty title', () => {
    renderWithProviders(
      <AdminTable query={query({ data: [] })} label="People" columns={columns} rowKey={(p) => p.id} />,
    );
    const table = screen.getByRole('table', { name: 'People' });
    expect(within(table).getAllByRole('row')).toHaveLength(1);
    expect(within(table).getByRole('columnheader', { name: 'Name' })).toBeInTheDocument();
  });

  it('renders one row per item with the cells of each column and a named column of buttons', async () => {
    renderWithProviders(
      <AdminTable query={query({})} label="People" columns={columns} rowKey={(p) => p.id} />,
    );
    const table = screen.getByRole('table', { name: 'People' });
    const headers = within(table).getAllByRole('columnheader');
    expect(headers.map((h) => h.textContent)).toEqual(['Name', 'Role', 'Edit']);
    const rows = within(table).getAllByRole('row').slice(1);
    expect(
      rows.map((r) =>
        within(r)
          .getAllByRole('cell')
          .map((c) => c.textContent),
      ),
    ).toEqual([
      ['Tomasz Quell', 'checker', 'Edit'],
      ['Priya Halvorsen', 'consultant', 'Edit'],
    ]);
    // The buttons in the cells are reachable from the keyboard in row order.
    await userEvent.tab();
    expect(screen.getByRole('button', { name: 'Edit Tomasz Quell' })).toHaveFocus();
    await userEvent.tab();
    expect(screen.getByRole('button', { name: 'Edit Priya Halvorsen' })).toHaveFocus();
  });

  it('marks the selected row and renders the aside with the loaded rows', () => {
    const aside = vi.fn((rows: readonly Person[]) => <p>Showing {rows.length} people</p>);
    renderWithProviders(
      <AdminTable
        query={query({})}
        label="People"
        columns={columns}
        rowKey={(p) => p.id}
        isSelected={(p) => p.id === 2}
        aside={aside}
      />,
    );
    const rows = within(screen.getByRole('table', { name: 'People' }))
      .getAllByRole('row')
      .slice(1);
    expect(rows[0]).toHaveAttribute('aria-selected', 'false');
    expect(rows[1]).toHaveAttribute('aria-selected', 'true');
    expect(screen.getByText('Showing 2 people')).toBeInTheDocument();
    expect(aside).toHaveBeenCalledWith(PEOPLE);
  });
});
