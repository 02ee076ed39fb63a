import {
  makeStyles,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  tokens,
} from '@fluentui/react-components';
import type { Key, ReactNode } from 'react';
import { HorizontalScroll } from '@/components/horizontal-scroll';
import { EmptyState, ErrorState, LoadingState } from '@/components/states';

const useStyles = makeStyles({
  // Fluent's Dropdown keeps a 250 px minimum; in a cell it ran over the next column (Role over Active).
  wrap: { '& .fui-Dropdown': { minWidth: 0, width: '100%' } },
  columns: {
    display: 'grid',
    gridTemplateColumns: 'minmax(0, 1fr) minmax(0, 1fr)',
    gap: tokens.spacingHorizontalL,
    '@media (max-width: 1000px)': { gridTemplateColumns: '1fr' },
  },
  hidden: {
    position: 'absolute',
    width: '1px',
    height: '1px',
    margin: '-1px',
    padding: 0,
    overflow: 'hidden',
    clip: 'rect(0 0 0 0)',
    whiteSpace: 'nowrap',
    border: 0,
  },
});

/** The part of a TanStack Query result the table reads (any `useQuery` result of a list fits). */
export interface ListQuery<T> {
  readonly isPending: boolean;
  readonly isError: boolean;
  readonly error: unknown;
  readonly data: readonly T[] | undefined;
  readonly refetch: () => unknown;
}

export interface AdminColumn<T> {
  readonly id: string;
  /** The column heading; with `hideHeader` only screen readers read it (a column of buttons). */
  readonly header: string;
  readonly hideHeader?: boolean;
  readonly cell: (row: T) => ReactNode;
}

export interface AdminTableProps<T> {
  readonly query: ListQuery<T>;
  /** The table's accessible name. */
  readonly label: string;
  readonly columns: readonly AdminColumn<T>[];
  readonly rowKey: (row: T) => Key;
  /** Shown instead of the table when the list is empty; without it the headings stand alone. */
  readonly emptyTitle?: string;
  readonly loadingLabel?: string;
  readonly size?: 'small' | 'medium';
  /** Marks the row the panel beside the table is showing (`aria-selected`). */
  readonly isSelected?: (row: T) => boolean;
  /** The table's least width; narrower screens scroll it sideways (default 640px). */
  readonly minWidth?: string;
  /** A panel beside the table (below it on narrow screens), given the loaded rows. */
  readonly aside?: (rows: readonly T[]) => ReactNode;
}

/**
 * A list from the API as a labelled table, with its loading, error (with retry) and empty states:
 * the scaffolding the admin panels share. Cells come from the column definitions.
 */
export function AdminTable<T>({
  query,
  label,
  columns,
  rowKey,
  emptyTitle,
  loadingLabel,
  size,
  isSelected,
  aside,
  minWidth = '640px',
}: AdminTableProps<T>) {
  const styles = useStyles();
  if (query.isPending) return <LoadingState label={loadingLabel} />;
  if (query.isError || !query.data)
    return <ErrorState error={query.error} onRetry={() => void query.refetch()} />;
  const rows = query.data;
  if (rows.length === 0 && emptyTitle) return <EmptyState title={emptyTitle} />;

  const table = (
    <HorizontalScroll label={`${label}, table`} className={styles.wrap} minWidth={minWidth}>
      <Table size={size} aria-label={label}>
        <TableHeader>
          <TableRow>
            {columns.map((c) => (
              <TableHeaderCell key={c.id}>
                {c.hideHeader ? <span className={styles.hidden}>{c.header}</span> : c.header}
              </TableHeaderCell>
            ))}
          </TableRow>
        </TableHeader>
        <TableBody>
          {rows.map((row) => (
            <TableRow key={rowKey(row)} aria-selected={isSelected ? isSelected(row) : undefined}>
              {columns.map((c) => (
                <TableCell key={c.id}>{c.cell(row)}</TableCell>
              ))}
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </HorizontalScroll>
  );
  if (!aside) return table;
  return (
    <div className={styles.columns}>
      {table}
      {aside(rows)}
    </div>
  );
}
